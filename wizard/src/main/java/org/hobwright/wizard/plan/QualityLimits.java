package org.hobwright.wizard.plan;

import java.util.Optional;
import java.util.OptionalDouble;
import org.hobwright.api.cycle.ToleranceData;
import org.hobwright.api.job.QualityTargets;
import org.hobwright.wizard.store.CuttingData;
import org.hobwright.wizard.store.QualityDefaults;

/**
 * The quality limits a plan is checked against, each with where it came from.
 *
 * <p>Defaults: the job's own targets win; otherwise, with a flank tolerance class, a share of the
 * form tolerance the effect shows in (feed marks lie along the tooth trace: helix form f_fβT;
 * enveloping flats lie across the profile: profile form f_fαT; the share is in the cutting-data
 * file, common practice, no source); otherwise the cutting-data file's defaults. The chip-thickness
 * limit comes from the job or the cutting-data row, and is unknown (NaN) without either.
 *
 * @param feedMarkUm          flank feed-mark limit, µm
 * @param feedMarkSource      where it came from
 * @param envelopingUm        enveloping-depth limit, µm
 * @param envelopingSource    where it came from
 * @param chipMm              chip-thickness limit, mm, NaN when unknown
 * @param chipSource          where it came from
 */
public record QualityLimits(double feedMarkUm, String feedMarkSource, double envelopingUm, String envelopingSource,
                      double chipMm, String chipSource) {

    /**
     * Resolves the limits of a job.
     *
     * @param given      the job's targets
     * @param tolerances the ISO 1328-1 tolerances, when known
     * @param defaults   the cutting-data file's defaults
     * @param row        the cutting-data row, when known
     */
    public static QualityLimits of(QualityTargets given, Optional<ToleranceData> tolerances, QualityDefaults defaults,
                             Optional<CuttingData> row) {
        double mark;
        String markSource;
        double env;
        String envSource;
        if (tolerances.isPresent()) {
            ToleranceData t = tolerances.get();
            mark = defaults.toleranceShare() * t.helixFormUm();
            markSource = "share " + defaults.toleranceShare() + " of helix form tolerance f_fβT of flank class "
                    + t.flankToleranceClass() + " (ISO 1328-1:2013; share: " + PlanSources.NO_SOURCE + ")";
            env = defaults.toleranceShare() * t.profileFormUm();
            envSource = "share " + defaults.toleranceShare() + " of profile form tolerance f_fαT of flank class "
                    + t.flankToleranceClass() + " (ISO 1328-1:2013; share: " + PlanSources.NO_SOURCE + ")";
        } else {
            mark = defaults.feedMarkDepthUm();
            markSource = "default of the " + PlanSources.TABLE;
            env = defaults.envelopingDepthUm();
            envSource = markSource;
        }
        if (given.feedMarkDepthUm().isPresent()) {
            mark = given.feedMarkDepthUm().getAsDouble();
            markSource = "cycle.targets.feedMarkDepth";
        }
        if (given.envelopingDepthUm().isPresent()) {
            env = given.envelopingDepthUm().getAsDouble();
            envSource = "cycle.targets.envelopingDepth";
        }
        double chip = Double.NaN;
        String chipSource = "none";
        if (given.maxChipThicknessMm().isPresent()) {
            chip = given.maxChipThicknessMm().getAsDouble();
            chipSource = "cycle.targets.maxChipThickness";
        } else if (row.isPresent()) {
            chip = row.get().maxChipThicknessMm();
            chipSource = PlanSources.TABLE;
        }
        return new QualityLimits(mark, markSource, env, envSource, chip, chipSource);
    }

    /** The limits as the api reports them (the chip limit empty when unknown). */
    public QualityTargets applied() {
        return new QualityTargets(OptionalDouble.of(feedMarkUm), OptionalDouble.of(envelopingUm),
                hasChipLimit() ? OptionalDouble.of(chipMm) : OptionalDouble.empty());
    }

    /** True when a chip-thickness limit is known. */
    public boolean hasChipLimit() {
        return !Double.isNaN(chipMm);
    }
}
