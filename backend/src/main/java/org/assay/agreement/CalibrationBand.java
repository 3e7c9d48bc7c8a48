package org.assay.agreement;

/**
 * One band of model confidence in a {@link CalibrationTable}: the drafts whose confidence
 * lies in [lower, upper), or in [lower, 1] for the last band, and how many of them the
 * validators accepted.
 *
 * @param lower the lower edge, included
 * @param upper the upper edge, excluded except for the last band (1.0)
 * @param drafts the number of drafts in the band
 * @param accepted how many of them were accepted
 * @param interval the Wilson score interval of the acceptance rate; NaN bounds when the
 * band is empty
 */
public record CalibrationBand(double lower, double upper, int drafts, int accepted, ConfidenceInterval interval) {

	/**
	 * @return accepted / drafts, NaN for an empty band
	 */
	public double rate() {
		return (this.drafts > 0) ? this.accepted / (double) this.drafts : Double.NaN;
	}

}
