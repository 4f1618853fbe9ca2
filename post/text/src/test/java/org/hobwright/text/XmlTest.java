package org.hobwright.text;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.StringReader;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;
import org.xml.sax.InputSource;

/** Escaped text reads back unchanged through the JDK's XML parser, as content and as attribute values. */
class XmlTest {

    @Test
    void escapedTextReadsBackThroughAnXmlParser() throws Exception {
        String text = "Tom's <gear> & \"pinion\" — z=12 > 11";
        String doc = "<a title=\"" + Xml.escape(text) + "\" alt='" + Xml.escape(text) + "'>" + Xml.escape(text) + "</a>";
        var root = DocumentBuilderFactory.newInstance().newDocumentBuilder()
                .parse(new InputSource(new StringReader(doc))).getDocumentElement();
        assertEquals(text, root.getTextContent());
        assertEquals(text, root.getAttribute("title"));
        assertEquals(text, root.getAttribute("alt"));
        assertEquals("a &amp; b", Xml.escape("a & b"));
    }
}
