package org.hobwright.samples.host;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/** The host's CSV reader against the rules of RFC 4180, section 2 (rules 1 to 7). */
class CsvTableTest {

    @Test
    void readsHeaderAndRowsWithCrlfOrLfLineEnds() {
        // RFC 4180 §2 rules 1-3: CRLF line breaks, last line may lack one, optional header line
        CsvTable crlf = CsvTable.parse("a,b\r\n1,2\r\n3,4");
        CsvTable lf = CsvTable.parse("a,b\n1,2\n3,4\n");
        assertEquals(List.of("a", "b"), crlf.header());
        assertEquals(List.of(List.of("1", "2"), List.of("3", "4")), crlf.rows());
        assertEquals(crlf, lf);
    }

    @Test
    void quotedFieldsMayHoldCommasLineBreaksAndDoubledQuotes() {
        // RFC 4180 §2 rules 5-7
        CsvTable t = CsvTable.parse("kind,text\ncomment,\"SYNC ON, 24:1\"\ncomment,\"say \"\"hi\"\"\nthere\"\n");
        assertEquals("SYNC ON, 24:1", t.rows().get(0).get(1));
        assertEquals("say \"hi\"\nthere", t.rows().get(1).get(1));
    }

    @Test
    void emptyFieldsAreKept() {
        CsvTable t = CsvTable.parse("a,b,c\n,,\n1,,3\n");
        assertEquals(List.of("", "", ""), t.rows().get(0));
        assertEquals(List.of("1", "", "3"), t.rows().get(1));
    }

    @Test
    void aRowOfTheWrongLengthNamesItsLine() {
        // RFC 4180 §2 rule 4: each line should contain the same number of fields
        var e = assertThrows(IllegalArgumentException.class, () -> CsvTable.parse("a,b\n1,2\n3\n"));
        assertTrue(e.getMessage().contains("line 3"), e.getMessage());
    }

    @Test
    void anUnclosedQuoteIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> CsvTable.parse("a\n\"open\n"));
        assertThrows(IllegalArgumentException.class, () -> CsvTable.parse(""));
    }
}
