package org.hobwright.api.job;

import org.hobwright.api.ApiStatus;
import org.hobwright.api.internal.Checks;

/**
 * The normal pitch of a gear or hob as the drawing gives it: a module in millimetres or a
 * diametral pitch in teeth per inch of diameter. The user's form is kept so that reports can
 * repeat it; {@link #moduleMm()} gives the canonical value.
 *
 * <p>m = 25.4 / P (module in mm, P in 1/in), the definition of diametral pitch.
 */
@ApiStatus(since = "1.0")
public sealed interface Pitch permits Pitch.Module, Pitch.Diametral {

    /** {@return normal module in millimetres} */
    double moduleMm();

    /** {@return normal diametral pitch in 1/in} */
    default double diametralPitch() {
        return Units.IN.toMm(1.0) / moduleMm();
    }

    /**
     * A pitch given as a module.
     *
     * @param mm normal module, mm, in the range of {@link JobFields#GEAR_MODULE}
     */
    @ApiStatus(since = "1.0")
    record Module(double mm) implements Pitch {
        /**
         * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and
         * the value.
         *
         * @param mm normal module, mm, greater than 0
         */
        public Module {
            Checks.range("module", mm, JobFields.GEAR_MODULE.range().min(), JobFields.GEAR_MODULE.range().max());
        }

        @Override
        public double moduleMm() {
            return mm;
        }
    }

    /**
     * A pitch given as a diametral pitch.
     *
     * @param perInch normal diametral pitch, 1/in, in the range of {@link JobFields#GEAR_DIAMETRAL_PITCH}
     */
    @ApiStatus(since = "1.0")
    record Diametral(double perInch) implements Pitch {
        /**
         * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and
         * the value.
         *
         * @param perInch normal diametral pitch, 1/in, greater than 0
         */
        public Diametral {
            Checks.range("diametralPitch", perInch, JobFields.GEAR_DIAMETRAL_PITCH.range().min(),
                    JobFields.GEAR_DIAMETRAL_PITCH.range().max());
        }

        @Override
        public double moduleMm() {
            return Units.IN.toMm(1.0) / perInch;
        }

        @Override
        public double diametralPitch() {
            return perInch;
        }
    }
}
