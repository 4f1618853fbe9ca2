package org.hobwright.wizard.plan;

/** Source texts the planner's findings and limits share. */
public final class PlanSources {
    /** Source text for rules of thumb. */
    public static final String NO_SOURCE = "common practice, no source";
    /** Source text for the machine profile limits. */
    public static final String MACHINE = "machine profile";
    /** Source text for the cutting-data table. */
    public static final String TABLE = "cutting-data table (typical values, to confirm with the hob supplier)";

    private PlanSources() {
    }
}
