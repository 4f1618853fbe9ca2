package org.hobwright.wizard.check;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import org.hobwright.api.check.Finding;
import org.hobwright.api.job.Units;
import org.hobwright.wizard.geometry.InvoluteGear;
import org.hobwright.wizard.geometry.ToothSystem;
import org.hobwright.wizard.inspection.InspectionValues;
import org.hobwright.wizard.inspection.SpanMeasurement;
import org.junit.jupiter.api.Test;

class InspectionChecksTest {

    // 20 teeth, module 2, 20°, x −0.7 (ISO 53 A): anvils over one tooth touch at 37.674 mm, below the start of
    // the involute at 37.686 mm (RootFormTest) though above the base circle 37.588 mm: the check must see it.
    @Test
    void spanAnvilsInTheUndercutAreReported() {
        InvoluteGear g = new InvoluteGear(20, 2, Math.toRadians(20), 0, -0.7, 0,
                ToothSystem.builtIn("iso53-a").orElseThrow());
        InspectionValues chosen = InspectionValues.of(g, g.tipDiameterMm(), OptionalDouble.empty(), 0.01);
        SpanMeasurement overOne = SpanMeasurement.over(g, 1);
        assertEquals(37.674, overOne.contactDiameterMm(), 5e-4);
        assertTrue(overOne.contactDiameterMm() > g.baseDiameterMm());
        InspectionValues forced = new InspectionValues(chosen.data(), overOne, chosen.pins(), chosen.pin(),
                chosen.chordal(), chosen.tipDiameterMm(), chosen.formDiameterMm());
        List<Finding> out = new ArrayList<>();
        InspectionChecks.check(g, 20, forced, new Wording(Units.MM), out);
        assertEquals(List.of("INSPECTION_SPAN_CONTACT"), out.stream().map(Finding::code).toList());
        assertTrue(out.get(0).message().contains("37.674"), out.get(0).message());
    }
}
