package org.hobwright.wizard.store;

/**
 * Default quality targets used when a job gives none, from the cutting-data file.
 *
 * @param feedMarkDepthUm   flank feed-mark limit when no tolerance class is known, µm
 * @param envelopingDepthUm enveloping-depth limit when no tolerance class is known, µm
 * @param toleranceShare    share of a form tolerance a single finish effect may use when the flank
 *                          tolerance class is known (feed marks: helix form f_fβT; enveloping flats:
 *                          profile form f_fαT), 0 to 1
 */
public record QualityDefaults(double feedMarkDepthUm, double envelopingDepthUm, double toleranceShare) {
    public QualityDefaults {
        if (!(feedMarkDepthUm > 0) || !(envelopingDepthUm > 0) || !(toleranceShare > 0 && toleranceShare <= 1)
                || !Double.isFinite(feedMarkDepthUm) || !Double.isFinite(envelopingDepthUm)) {
            throw new IllegalArgumentException("quality defaults must be positive (share 0 to 1), were "
                    + feedMarkDepthUm + ", " + envelopingDepthUm + ", " + toleranceShare);
        }
    }
}
