package org.hobwright.wizard.check;

/** Source texts shared by several finding codes. */
final class Sources {
    static final String RANGE = "plausibility range for hobbed gears, common practice, no source";
    static final String BLANK = "blank against tip diameter and hob tooth depth, common practice, no source";
    static final String DRAWING = "computed with ISO 21771 relations; tolerance max(0.01 mm, 1e-4 × value),"
            + " common practice, no source";

    private Sources() {
    }
}
