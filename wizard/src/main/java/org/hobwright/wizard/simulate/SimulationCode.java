package org.hobwright.wizard.simulate;

import org.hobwright.api.check.FindingCode;
import org.hobwright.api.check.Severity;

/** Finding codes of the generating simulation; listed in {@code wizard/FINDINGS.md}. */
public enum SimulationCode implements FindingCode {
    /** A planned job the simulation cannot run on; the cycle is planned without it. */
    SIM_NOT_RUN("the generating simulation cannot run on the job (for example a custom tip radius that leaves"
            + " no tip flat on the hob tooth); the cycle is planned without it");

    private final String meaning;

    SimulationCode(String meaning) {
        this.meaning = meaning;
    }

    @Override
    public String code() {
        return name();
    }

    @Override
    public Severity severity() {
        return Severity.WARNING;
    }

    @Override
    public String meaning() {
        return meaning;
    }

    @Override
    public String source() {
        return "generating simulation";
    }
}
