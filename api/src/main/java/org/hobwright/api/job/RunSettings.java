package org.hobwright.api.job;

import java.util.Objects;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import org.hobwright.api.ApiStatus;
import org.hobwright.api.internal.Checks;

/**
 * How a job runs at the machine: how many parts, under which program number and tool station,
 * how the hob sits on its arbor and how long it lasts.
 *
 * @param batchSize          parts of the batch, at least 1
 * @param programNumber      the program number, when the job or its template gives one (else the dialect's)
 * @param toolStation        the hob's tool station, when the job or its template gives one (else the dialect's)
 * @param hobTurnedRound     true when the hob is turned round on its arbor: its drive end faces away from the
 *                           spindle's drive, so the hob spindle must run against the hob's own cutting sense
 * @param hobLifePerToothM   wear criterion: length of gear tooth flank a hob tooth cuts before it must be
 *                           sharpened, m, when the job or its template gives one (else a typical value)
 */
@ApiStatus(since = "1.1")
public record RunSettings(int batchSize, OptionalInt programNumber, OptionalInt toolStation, boolean hobTurnedRound,
                          OptionalDouble hobLifePerToothM) {

    /** One part, the dialect's program number and tool station, the hob mounted the usual way. */
    public static final RunSettings DEFAULTS = new RunSettings(1, OptionalInt.empty(), OptionalInt.empty(), false,
            OptionalDouble.empty());

    /**
     * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and the
     * value.
     *
     * @param batchSize parts of the batch, at least 1
     * @param programNumber the program number, when the job or its template gives one (else the dialect's)
     * @param toolStation the hob's tool station, when the job or its template gives one (else the dialect's)
     * @param hobTurnedRound true when the hob is turned round on its arbor: its drive end faces away from the
     *     spindle's drive, so the hob spindle must run against the hob's own cutting sense
     * @param hobLifePerToothM wear criterion: length of gear tooth flank a hob tooth cuts before it must be
     *     sharpened, m, when the job or its template gives one (else a typical value)
     */
    public RunSettings {
        Checks.field(JobFields.CYCLE_BATCH_SIZE, batchSize);
        Objects.requireNonNull(programNumber, "programNumber");
        Checks.field(JobFields.CYCLE_PROGRAM_NUMBER, programNumber);
        Objects.requireNonNull(toolStation, "toolStation");
        Checks.field(JobFields.CYCLE_TOOL_STATION, toolStation);
        Objects.requireNonNull(hobLifePerToothM, "hobLifePerToothM");
        Checks.field(JobFields.HOB_LIFE_PER_TOOTH, hobLifePerToothM);
    }
}
