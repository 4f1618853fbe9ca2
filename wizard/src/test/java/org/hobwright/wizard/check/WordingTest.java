package org.hobwright.wizard.check;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.hobwright.api.job.Pitch;
import org.hobwright.api.job.Units;
import org.junit.jupiter.api.Test;

class WordingTest {
    // 1 in = 25.4 mm exactly (1959 international inch).
    @Test
    void lengthsInTheJobsUnit() {
        assertEquals("26 mm", new Wording(Units.MM).length(26.0));
        assertEquals("0.2981 mm", new Wording(Units.MM).length(0.298133));
        assertEquals("1.0625 in", new Wording(Units.IN).length(26.9875));
        assertEquals("-0.03 mm", new Wording(Units.MM).length(-0.03));
        assertEquals("13.2368°", new Wording(Units.MM).angle(13.236771));
        assertEquals("diametral pitch 12/in (module 2.1167 mm)", new Wording(Units.IN).pitch(new Pitch.Diametral(12)));
        assertEquals("gear.diametralPitch", Wording.pitchField("gear", new Pitch.Diametral(12)));
        assertEquals("hob.module", Wording.pitchField("hob", new Pitch.Module(2)));
    }

    @Test
    void countsTakeTheSingularForOne() {
        assertEquals("1 tooth", Wording.teeth(1));
        assertEquals("3 teeth", Wording.teeth(3));
        assertEquals("1 work turn", Wording.count(1, "work turn", "work turns"));
        assertEquals("0 work turns", Wording.count(0, "work turn", "work turns"));
    }
}
