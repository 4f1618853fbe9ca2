package org.hobwright.wizard.simulate;

/**
 * A job the generating simulation cannot run on. Carries what a finding needs: the field, what is
 * wrong and what would fix it.
 */
public final class SimulationInputException extends RuntimeException {
    private static final long serialVersionUID = 1L;
    private final String field;
    private final String fix;

    /**
     * @param field   the job field at fault, e.g. {@code hob.module}
     * @param message what is wrong, with the offending value
     * @param fix     what would fix it
     */
    public SimulationInputException(String field, String message, String fix) {
        super(message);
        this.field = field;
        this.fix = fix;
    }

    /** The job field at fault. */
    public String field() {
        return field;
    }

    /** What would fix it. */
    public String fix() {
        return fix;
    }
}
