package org.hobwright.api.cycle;

import org.hobwright.api.ApiStatus;
import org.hobwright.api.internal.Checks;

/**
 * One step of a hobbing cycle, in canonical units (mm, s, rpm, degrees). Steps name trade
 * quantities, not axis letters: {@code diameterMm} is the work diameter the hob tip reaches,
 * {@code axialMm} is the hob centre's position along the work axis measured from the gear's front
 * face (the face away from the chuck) toward its back face (negative before the front face). Moves
 * also carry the hob's tip (outside) diameter, so that the hob centre's distance from the work axis
 * is known ({@link Rapid#hobCentreRadiusMm()}). Mapping onto a machine's axes is the post's job,
 * from the dialect and machine profile (the cycle CSV gives both).
 *
 * <p>Each step says how long it takes; the cycle time is the sum of the steps' seconds.
 */
@ApiStatus(since = "1.0")
public sealed interface CycleStep {

    /** {@return duration of this step, s} */
    double seconds();

    /** {@return short lower-case kind used in the cycle CSV, e.g. {@code rapid}} */
    String kind();

    /**
     * A remark carried into the program as a comment.
     *
     * @param text the remark, one line
     */
    @ApiStatus(since = "1.0")
    record Comment(String text) implements CycleStep {
        /**
         * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and
         * the value.
         *
         * @param text the remark, one line
         */
        public Comment {
            Checks.present("text", text);
            if (text.contains("\n") || text.contains("\r")) {
                throw new IllegalArgumentException("comment must be one line, was \"" + text + "\"");
            }
        }

        @Override
        public double seconds() {
            return 0;
        }

        @Override
        public String kind() {
            return "comment";
        }
    }

    /**
     * Coolant on or off.
     *
     * @param on true to switch coolant on
     */
    @ApiStatus(since = "1.0")
    record Coolant(boolean on) implements CycleStep {
        @Override
        public double seconds() {
            return 0;
        }

        @Override
        public String kind() {
            return "coolant";
        }
    }

    /**
     * The swivel setting: a move of the swivel axis on a machine with a programmable swivel, or the
     * setting the setter makes by hand on a manual holder (no block in the program, a row in the
     * cycle CSV).
     *
     * @param machineAngleDeg the setting in the machine's own sign convention, degrees
     * @param seconds         time allowed, s
     * @param programmable    true when the control turns the swivel axis; false for a manual holder
     */
    @ApiStatus(since = "1.0")
    record Swivel(double machineAngleDeg, double seconds, @ApiStatus(since = "1.1") boolean programmable)
            implements CycleStep {
        /**
         * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and
         * the value.
         *
         * @param machineAngleDeg the setting in the machine's own sign convention, degrees
         * @param seconds time, s
         * @param programmable true when the control turns the swivel axis; false for a manual holder
         */
        public Swivel {
            Checks.range("machineAngleDeg", machineAngleDeg, -90, 90);
            Checks.nonNegative("seconds", seconds);
        }

        /**
         * A move of a programmable swivel axis (as the first api had it).
         *
         * @param machineAngleDeg the setting in the machine's own sign convention, degrees
         * @param seconds         time allowed, s
         */
        public Swivel(double machineAngleDeg, double seconds) {
            this(machineAngleDeg, seconds, true);
        }

        @Override
        public String kind() {
            return "swivel";
        }
    }

    /**
     * Start both spindles and lock them in the generating ratio.
     *
     * @param hobTurns             hob turns of the ratio (whole number)
     * @param workTurns            work turns of the ratio (whole number)
     * @param hobRpm               hob speed, rpm
     * @param workRpm              work speed from the ratio, rpm (without the helical addition)
     * @param hobRotation          hob sense of rotation
     * @param workRotation         work sense of rotation
     * @param differentialDegPerMm additional work rotation per mm of axial hob travel toward the
     *                             back face, degrees, signed in the work's rotation sense (0 for spur)
     * @param seconds              time to start and lock, s
     */
    @ApiStatus(since = "1.0")
    record SyncOn(int hobTurns, int workTurns, double hobRpm, double workRpm, Rotation hobRotation,
                  Rotation workRotation, double differentialDegPerMm, double seconds) implements CycleStep {
        /**
         * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and
         * the value.
         *
         * @param hobTurns hob turns of the ratio (whole number)
         * @param workTurns work turns of the ratio (whole number)
         * @param hobRpm hob speed, rpm
         * @param workRpm work speed from the ratio, rpm (without the helical addition)
         * @param hobRotation hob sense of rotation
         * @param workRotation work sense of rotation
         * @param differentialDegPerMm additional work rotation per mm of axial hob travel toward the
         * @param seconds time, s
         */
        public SyncOn {
            Checks.atLeast("hobTurns", hobTurns, 1);
            Checks.atLeast("workTurns", workTurns, 1);
            Checks.positive("hobRpm", hobRpm);
            Checks.positive("workRpm", workRpm);
            Checks.present("hobRotation", hobRotation);
            Checks.present("workRotation", workRotation);
            Checks.finite("differentialDegPerMm", differentialDegPerMm);
            Checks.nonNegative("seconds", seconds);
        }

        @Override
        public String kind() {
            return "sync-on";
        }
    }

    /**
     * Release the synchronisation (spindles still turning).
     *
     * @param seconds time, s
     */
    @ApiStatus(since = "1.0")
    record SyncOff(double seconds) implements CycleStep {
        /**
         * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and
         * the value.
         *
         * @param seconds time, s
         */
        public SyncOff {
            Checks.nonNegative("seconds", seconds);
        }

        @Override
        public String kind() {
            return "sync-off";
        }
    }

    /**
     * Stop both spindles.
     *
     * @param seconds time to stop, s
     */
    @ApiStatus(since = "1.0")
    record SpindlesStop(double seconds) implements CycleStep {
        /**
         * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and
         * the value.
         *
         * @param seconds time, s
         */
        public SpindlesStop {
            Checks.nonNegative("seconds", seconds);
        }

        @Override
        public String kind() {
            return "spindles-stop";
        }
    }

    /**
     * Wait, e.g. for the synchronisation to settle.
     *
     * @param seconds time, s
     */
    @ApiStatus(since = "1.0")
    record Dwell(double seconds) implements CycleStep {
        /**
         * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and
         * the value.
         *
         * @param seconds time, s
         */
        public Dwell {
            Checks.nonNegative("seconds", seconds);
        }

        @Override
        public String kind() {
            return "dwell";
        }
    }

    /**
     * Move the hob along its own axis to a new shift position.
     *
     * @param positionMm shift position from the hob's start end, mm
     * @param seconds    time, s
     */
    @ApiStatus(since = "1.0")
    record HobShift(double positionMm, double seconds) implements CycleStep {
        /**
         * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and
         * the value.
         *
         * @param positionMm shift position from the hob's start end, mm
         * @param seconds time, s
         */
        public HobShift {
            Checks.nonNegative("positionMm", positionMm);
            Checks.nonNegative("seconds", seconds);
        }

        @Override
        public String kind() {
            return "hob-shift";
        }
    }

    /**
     * Rapid move (no cutting) to a position.
     *
     * @param pass             pass number (1 = first), 0 outside the passes
     * @param diameterMm       work diameter the hob tip reaches at the end of the move, mm
     * @param axialMm          hob centre along the work axis from the front face, mm
     * @param seconds          time, s
     * @param hobTipDiameterMm the hob's tip (outside) diameter d_a0, mm; 0 when not given
     */
    @ApiStatus(since = "1.0")
    record Rapid(int pass, double diameterMm, double axialMm, double seconds,
                 @ApiStatus(since = "1.1") double hobTipDiameterMm) implements CycleStep {
        /**
         * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and
         * the value.
         *
         * @param pass pass number (1 = first), 0 outside the passes
         * @param diameterMm work diameter the hob tip reaches at the end of the move, mm
         * @param axialMm hob centre along the work axis from the front face, mm
         * @param seconds time, s
         * @param hobTipDiameterMm the hob's tip (outside) diameter d_a0, mm; 0 when not given
         */
        public Rapid {
            Checks.atLeast("pass", pass, 0);
            Checks.nonNegative("diameterMm", diameterMm);
            Checks.finite("axialMm", axialMm);
            Checks.nonNegative("seconds", seconds);
            Checks.nonNegative("hobTipDiameterMm", hobTipDiameterMm);
        }

        /**
         * A rapid move without the hob's tip diameter (as the first api had it).
         *
         * @param pass       pass number, 0 outside the passes
         * @param diameterMm work diameter the hob tip reaches, mm
         * @param axialMm    hob centre along the work axis, mm
         * @param seconds    time, s
         */
        public Rapid(int pass, double diameterMm, double axialMm, double seconds) {
            this(pass, diameterMm, axialMm, seconds, 0);
        }

        /**
         * The hob centre's distance from the work axis at the end of the move, mm: half the work
         * diameter the tip reaches plus half the hob's tip diameter (the common perpendicular of
         * the crossed axes, whatever the swivel). Empty when the step does not carry the tip diameter.
         *
         * @return the centre distance, mm
         */
        @ApiStatus(since = "1.1")
        public java.util.OptionalDouble hobCentreRadiusMm() {
            return hobTipDiameterMm == 0 ? java.util.OptionalDouble.empty()
                    : java.util.OptionalDouble.of((diameterMm + hobTipDiameterMm) / 2);
        }

        @Override
        public String kind() {
            return "rapid";
        }
    }

    /**
     * Feed move at a feed per work revolution.
     *
     * @param pass          pass number (1 = first), 0 outside the passes
     * @param diameterMm    work diameter the hob tip reaches at the end of the move, mm
     * @param axialMm       hob centre along the work axis from the front face, mm
     * @param feedMmPerRev  feed per work revolution, mm
     * @param cutting       true when the hob removes material during this move
     * @param seconds       time, s
     * @param hobTipDiameterMm the hob's tip (outside) diameter d_a0, mm; 0 when not given
     */
    @ApiStatus(since = "1.0")
    record Feed(int pass, double diameterMm, double axialMm, double feedMmPerRev, boolean cutting,
                double seconds, @ApiStatus(since = "1.1") double hobTipDiameterMm) implements CycleStep {
        /**
         * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and
         * the value.
         *
         * @param pass pass number, 0 outside the passes
         * @param diameterMm work diameter the hob tip reaches, mm
         * @param axialMm hob centre along the work axis, mm
         * @param feedMmPerRev feed per work revolution, mm
         * @param cutting true when the hob removes material
         * @param seconds time, s
         * @param hobTipDiameterMm the hob's tip (outside) diameter d_a0, mm; 0 when not given
         */
        public Feed {
            Checks.atLeast("pass", pass, 0);
            Checks.nonNegative("diameterMm", diameterMm);
            Checks.finite("axialMm", axialMm);
            Checks.positive("feedMmPerRev", feedMmPerRev);
            Checks.nonNegative("seconds", seconds);
            Checks.nonNegative("hobTipDiameterMm", hobTipDiameterMm);
        }

        /**
         * A feed move without the hob's tip diameter (as the first api had it).
         *
         * @param pass         pass number, 0 outside the passes
         * @param diameterMm   work diameter the hob tip reaches, mm
         * @param axialMm      hob centre along the work axis, mm
         * @param feedMmPerRev feed per work revolution, mm
         * @param cutting      true when the hob removes material
         * @param seconds      time, s
         */
        public Feed(int pass, double diameterMm, double axialMm, double feedMmPerRev, boolean cutting,
                    double seconds) {
            this(pass, diameterMm, axialMm, feedMmPerRev, cutting, seconds, 0);
        }

        /**
         * The hob centre's distance from the work axis at the end of the move, mm: half the work
         * diameter the tip reaches plus half the hob's tip diameter (the common perpendicular of
         * the crossed axes, whatever the swivel). Empty when the step does not carry the tip diameter.
         *
         * @return the centre distance, mm
         */
        @ApiStatus(since = "1.1")
        public java.util.OptionalDouble hobCentreRadiusMm() {
            return hobTipDiameterMm == 0 ? java.util.OptionalDouble.empty()
                    : java.util.OptionalDouble.of((diameterMm + hobTipDiameterMm) / 2);
        }

        @Override
        public String kind() {
            return "feed";
        }
    }
}
