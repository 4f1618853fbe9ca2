package org.hobwright.post.nc;

import org.hobwright.text.Scaled;
import org.hobwright.api.job.Units;

/**
 * The scale of each numeric word: canonical values (mm, mm per work revolution, degrees per mm)
 * to the numbers a dialect writes (the job's unit, the radial axis as a diameter or a radius,
 * the axis signs) and back. The decimals of each word come from the dialect.
 */
final class WordUnits {
    private final Dialect d;
    private final Units units;

    WordUnits(Dialect dialect, Units units) {
        this.d = dialect;
        this.units = units;
    }

    Units units() {
        return units;
    }

    /** Radial word before its sign: the job-unit diameter, or radius, of a work diameter in mm. */
    double radial(double diameterMm) {
        double v = units.fromMm(diameterMm);
        return d.radial().diameter() ? v : v / 2;
    }

    /** The work diameter in mm a posted radial word programs. */
    double diameterMm(Scaled word) {
        double v = word.value() * d.radial().sign();
        return units.toMm(d.radial().diameter() ? v : 2 * v);
    }

    /** Axial word before its sign: the job-unit position of a hob-centre position in mm. */
    double axial(double axialMm) {
        return units.fromMm(axialMm);
    }

    /** The hob-centre position in mm a posted axial word programs. */
    double axialMm(Scaled word) {
        return units.toMm(word.value() * d.axial().sign());
    }

    /** Feed word: feed per work revolution in the job's unit. */
    double feed(double mmPerRev) {
        return units.fromMm(mmPerRev);
    }

    /** The feed per work revolution in mm a posted feed word programs. */
    double feedMmPerRev(Scaled word) {
        return units.toMm(word.value());
    }

    /** Decimals the dialect writes for a numeric placeholder. */
    int decimals(Placeholder p) {
        Dialect.Decimals dec = d.decimals();
        return switch (p) {
            case RADIAL, AXIAL, SHIFT, SAFE_RADIAL -> dec.length(units);
            case FEED -> dec.feed(units);
            case HOB_RPM, WORK_RPM -> dec.rpm();
            case SWIVEL -> dec.deg();
            case DIFFERENTIAL -> dec.differential();
            case SECONDS -> dec.s();
            default -> 0;
        };
    }

    /** The dialect key of a placeholder's decimals, for messages ({@code decimals.mmPerRev}). */
    String decimalsKey(Placeholder p) {
        return "decimals." + switch (p) {
            case RADIAL, AXIAL, SHIFT, SAFE_RADIAL -> units == Units.MM ? "mm" : "in";
            case FEED -> units == Units.MM ? "mmPerRev" : "inPerRev";
            case HOB_RPM, WORK_RPM -> "rpm";
            case SWIVEL -> "deg";
            case DIFFERENTIAL -> "differential";
            case SECONDS -> "s";
            default -> "(whole number)";
        };
    }
}
