package org.hobwright.post.sheet;

import org.hobwright.api.job.Units;
import org.hobwright.text.Decimal;
import org.hobwright.post.JobUnits;

/**
 * Display rounding of the setup sheet (the report keeps the unrounded values): lengths to 3
 * decimals in millimetres and 4 in inches, angles to 4 decimals, hob speed to 1 decimal, work
 * speed to 3, times to 1, micrometres to 2.
 *
 * @param u the job's units
 */
record SheetFormat(JobUnits u) {

    /** A length given in mm, in the job's unit, without the unit. */
    String len(double mm) {
        return Decimal.fixed(u.length(mm), u.units() == Units.MM ? 3 : 4);
    }

    /** A length given in mm, in the job's unit, with the unit. */
    String lenU(double mm) {
        return len(mm) + " " + u.lengthSymbol();
    }

    /** An angle, degrees, with the degree sign. */
    String deg(double deg) {
        return Decimal.fixed(deg, 4) + "°";
    }

    /** Hob speed. */
    String hobRpm(double rpm) {
        return Decimal.fixed(rpm, 1) + " rpm";
    }

    /** Work speed. */
    String workRpm(double rpm) {
        return Decimal.fixed(rpm, 3) + " rpm";
    }

    /** A time, s. */
    String seconds(double s) {
        return Decimal.fixed(s, 1) + " s";
    }

    /** Micrometres. */
    String um(double um) {
        return Decimal.fixed(um, 2) + " µm";
    }

    /** Feed per work revolution. */
    String feed(double mmPerRev) {
        return len(mmPerRev) + " " + u.lengthSymbol() + "/rev";
    }

    /** Cutting speed. */
    String cuttingSpeed(double mPerMin) {
        return Decimal.fixed(u.cuttingSpeed(mPerMin), 1) + " " + u.speedSymbol();
    }
}
