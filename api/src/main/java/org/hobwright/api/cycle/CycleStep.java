package org.hobwright.api.cycle;

import org.hobwright.api.Validate;

/**
 * One step of a hobbing cycle, in canonical units (mm, s, rpm, degrees). Steps name trade
 * quantities, not axis letters: {@code diameterMm} is the work diameter the hob tip reaches,
 * {@code axialMm} is the hob centre's position along the work axis measured from the gear's front
 * face (the face away from the chuck) toward its back face (negative before the front face). Mapping onto a machine's axes is the
 * post's job, from the dialect and machine profile.
 *
 * <p>Each step says how long it takes; the cycle time is the sum of the steps' seconds.
 */
public sealed interface CycleStep {

    /** Duration of this step, s. */
    double seconds();

    /** Short lower-case kind used in the cycle CSV, e.g. {@code rapid}. */
    String kind();

    /**
     * A remark carried into the program as a comment.
     *
     * @param text the remark, one line
     */
    record Comment(String text) implements CycleStep {
        public Comment {
            Validate.present("text", text);
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
     * Turn the swivel axis to a setting (only on machines with a programmable swivel).
     *
     * @param machineAngleDeg the setting in the machine's own sign convention, degrees
     * @param seconds         time allowed, s
     */
    record Swivel(double machineAngleDeg, double seconds) implements CycleStep {
        public Swivel {
            Validate.range("machineAngleDeg", machineAngleDeg, -90, 90);
            Validate.nonNegative("seconds", seconds);
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
    record SyncOn(int hobTurns, int workTurns, double hobRpm, double workRpm, Rotation hobRotation,
                  Rotation workRotation, double differentialDegPerMm, double seconds) implements CycleStep {
        public SyncOn {
            Validate.atLeast("hobTurns", hobTurns, 1);
            Validate.atLeast("workTurns", workTurns, 1);
            Validate.positive("hobRpm", hobRpm);
            Validate.positive("workRpm", workRpm);
            Validate.present("hobRotation", hobRotation);
            Validate.present("workRotation", workRotation);
            Validate.finite("differentialDegPerMm", differentialDegPerMm);
            Validate.nonNegative("seconds", seconds);
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
    record SyncOff(double seconds) implements CycleStep {
        public SyncOff {
            Validate.nonNegative("seconds", seconds);
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
    record SpindlesStop(double seconds) implements CycleStep {
        public SpindlesStop {
            Validate.nonNegative("seconds", seconds);
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
    record Dwell(double seconds) implements CycleStep {
        public Dwell {
            Validate.nonNegative("seconds", seconds);
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
    record HobShift(double positionMm, double seconds) implements CycleStep {
        public HobShift {
            Validate.nonNegative("positionMm", positionMm);
            Validate.nonNegative("seconds", seconds);
        }

        @Override
        public String kind() {
            return "hob-shift";
        }
    }

    /**
     * Rapid move (no cutting) to a position.
     *
     * @param pass       pass number (1 = first), 0 outside the passes
     * @param diameterMm work diameter the hob tip reaches at the end of the move, mm
     * @param axialMm    hob centre along the work axis from the front face, mm
     * @param seconds    time, s
     */
    record Rapid(int pass, double diameterMm, double axialMm, double seconds) implements CycleStep {
        public Rapid {
            Validate.atLeast("pass", pass, 0);
            Validate.nonNegative("diameterMm", diameterMm);
            Validate.finite("axialMm", axialMm);
            Validate.nonNegative("seconds", seconds);
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
     */
    record Feed(int pass, double diameterMm, double axialMm, double feedMmPerRev, boolean cutting,
                double seconds) implements CycleStep {
        public Feed {
            Validate.atLeast("pass", pass, 0);
            Validate.nonNegative("diameterMm", diameterMm);
            Validate.finite("axialMm", axialMm);
            Validate.positive("feedMmPerRev", feedMmPerRev);
            Validate.nonNegative("seconds", seconds);
        }

        @Override
        public String kind() {
            return "feed";
        }
    }
}
