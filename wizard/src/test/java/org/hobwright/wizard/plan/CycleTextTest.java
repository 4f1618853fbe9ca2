package org.hobwright.wizard.plan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Locale;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.CycleSummary;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.cycle.SetupValues;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.testkit.SampleJobs;
import org.junit.jupiter.api.Test;

/**
 * What a script prints: a cycle as the few lines a programmer reads (the same numbers as the
 * cycle's records), and findings one line each.
 */
class CycleTextTest {
    private final DefaultCyclePlanner planner = new DefaultCyclePlanner();

    @Test
    void aPlannedCyclePrintsAsItsSummary() {
        HobCycle cycle = planner.plan(SampleJobs.helicalMetric());
        String text = cycle.toString();
        List<String> lines = text.lines().toList();
        assertEquals(4 + cycle.findings().size(), lines.size(), text);
        assertTrue(text.length() < 600 + 300 * cycle.findings().size(), "short: " + text.length() + " characters");
        SetupValues s = cycle.setup().orElseThrow();
        CycleSummary c = cycle.summary().orElseThrow();
        assertEquals("cycle: " + cycle.steps().size() + " steps", lines.get(0).replaceFirst(", \\d+ warning\\(s\\)$", ""));
        assertTrue(lines.get(1).contains(String.format(Locale.ROOT, "root %.3f mm",
                cycle.gear().orElseThrow().rootDiameterMm())), lines.get(1));
        assertTrue(lines.get(2).contains("swivel " + s.swivelSettingText()), lines.get(2));
        assertTrue(lines.get(2).contains("ratio " + s.syncHobTurns() + ":" + s.syncWorkTurns()), lines.get(2));
        assertTrue(lines.get(3).contains(String.format(Locale.ROOT, "%.1f s", c.cycleTimeS())), lines.get(3));
        for (Finding f : cycle.findings()) {
            assertTrue(lines.contains(f.line()), f.line());
        }
    }

    @Test
    void aRefusedCyclePrintsItsErrorsOneLineEach() {
        HobJob job = SampleJobs.helicalOnSpurMachine();
        HobCycle cycle = planner.plan(job);
        assertTrue(cycle.hasErrors());
        String text = cycle.toString();
        assertTrue(text.startsWith("cycle: not planned, "), text);
        assertTrue(text.endsWith(Finding.lines(cycle.findings())), text);
        for (Finding f : cycle.findings()) {
            assertFalse(f.line().contains("\n") || f.line().contains("\r"), "one line: " + f.line());
            assertEquals(f.line(), f.toString());
            assertTrue(f.line().contains(f.code()) && f.line().contains(f.field()), f.line());
        }
        assertEquals(cycle.findings().size(), Finding.lines(cycle.findings()).lines().count());
    }
}
