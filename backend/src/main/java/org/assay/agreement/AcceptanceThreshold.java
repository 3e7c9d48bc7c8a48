package org.assay.agreement;

/**
 * The answer of {@link CalibrationTable#lowestThreshold(double, Bound)}: the lowest model
 * confidence from which drafts are accepted at a target rate, or why there is none.
 */
public sealed interface AcceptanceThreshold {

	/**
	 * @return true for {@link Met}
	 */
	default boolean met() {
		return this instanceof Met;
	}

	/**
	 * A threshold exists.
	 *
	 * @param pool the drafts at or above the threshold, whose bound meets the target
	 */
	record Met(Pool pool) implements AcceptanceThreshold {

		/**
		 * @return the threshold, a band's lower edge
		 */
		public double threshold() {
			return this.pool.threshold();
		}

	}

	/**
	 * No threshold exists: the drafts at or above the highest edge with drafts already
	 * miss the target.
	 *
	 * @param highest those drafts, with their interval
	 */
	record NotMet(Pool highest) implements AcceptanceThreshold {

	}

	/** No drafts at all. */
	record NoDrafts() implements AcceptanceThreshold {

	}

	/** Which bound of the Wilson interval must reach the target. */
	enum Bound {

		/** Conservative: the data show the rate is at least the target. */
		LOWER,

		/** Liberal: the data do not show the rate is below the target. */
		UPPER

	}

	/**
	 * The drafts with model confidence at or above a threshold, pooled.
	 *
	 * @param threshold the lower edge of a band
	 * @param drafts the number of drafts at or above it
	 * @param accepted how many of them were accepted
	 * @param interval the Wilson score interval of their acceptance rate
	 */
	record Pool(double threshold, int drafts, int accepted, ConfidenceInterval interval) {

		/**
		 * @return accepted / drafts, NaN when there are none
		 */
		public double rate() {
			return (this.drafts > 0) ? this.accepted / (double) this.drafts : Double.NaN;
		}

		boolean reaches(double target, Bound bound) {
			return ((bound == Bound.LOWER) ? this.interval.lower() : this.interval.upper()) >= target;
		}

	}

}
