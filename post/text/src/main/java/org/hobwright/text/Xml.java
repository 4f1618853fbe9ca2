package org.hobwright.text;

/** Text for XML, XHTML and SVG documents. */
public final class Xml {
    private Xml() {
    }

    /**
     * Escapes the five XML special characters, so the text may stand as element content or as an
     * attribute value in double or single quotes (XML 1.0, fifth edition, section 2.4).
     */
    public static String escape(String s) {
        StringBuilder out = new StringBuilder(s.length());
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '&' -> out.append("&amp;");
                case '<' -> out.append("&lt;");
                case '>' -> out.append("&gt;");
                case '"' -> out.append("&quot;");
                case '\'' -> out.append("&#39;");
                default -> out.append(c);
            }
        }
        return out.toString();
    }
}
