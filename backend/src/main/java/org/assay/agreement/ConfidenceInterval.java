package org.assay.agreement;

/**
 * A two-sided confidence interval for an estimate.
 *
 * @param lower the lower bound
 * @param upper the upper bound
 * @param level the confidence level, for example 0.95
 */
public record ConfidenceInterval(double lower, double upper, double level) {

	/**
	 * Whether a value lies in the interval, bounds included.
	 * @param value the value
	 * @return true if {@code lower <= value <= upper}
	 */
	public boolean contains(double value) {
		return this.lower <= value && value <= this.upper;
	}

}
