package org.assay.agreement;

/**
 * The Wilson score interval for a binomial proportion, without continuity correction.
 *
 * <p>
 * With x successes in n trials, p&#770; = x/n and z the two-sided critical value of the
 * standard normal distribution for the level (1.959963984540054 for 95%), the bounds are
 * <pre>
 *   (p&#770; + z&sup2;/(2n) &plusmn; z &middot; &radic;(p&#770;(1 - p&#770;)/n + z&sup2;/(4n&sup2;))) / (1 + z&sup2;/n)
 * </pre> the two roots in p of (p&#770; - p)&sup2; = z&sup2; p(1 - p)/n. Sources: Wilson,
 * E.B. (1927), Probable inference, the law of succession, and statistical inference, JASA
 * 22:209-212; Newcombe, R.G. (1998), Two-sided confidence intervals for the single
 * proportion: comparison of seven methods, Statistics in Medicine 17:857-872, method 3.
 *
 * <p>
 * Unlike the Wald interval p&#770; &plusmn; z&radic;(p&#770;(1-p&#770;)/n) it stays in
 * [0, 1] and does not collapse to a point at x = 0 or x = n; there the outer bound is
 * exactly 0 or 1 (set so, rather than left to rounding). With no trials the proportion is
 * undefined and both bounds are NaN.
 */
public final class WilsonInterval {

	private WilsonInterval() {
	}

	/**
	 * The 95% Wilson score interval.
	 * @param successes x, from 0 to trials
	 * @param trials n &ge; 0
	 * @return the interval, NaN bounds when n = 0
	 */
	public static ConfidenceInterval of(long successes, long trials) {
		return of(successes, trials, 0.95);
	}

	/**
	 * The Wilson score interval at a confidence level.
	 * @param successes x, from 0 to trials
	 * @param trials n &ge; 0
	 * @param level the two-sided confidence level, between 0 and 1
	 * @return the interval, NaN bounds when n = 0
	 */
	public static ConfidenceInterval of(long successes, long trials, double level) {
		if (trials < 0 || successes < 0 || successes > trials) {
			throw new IllegalArgumentException(
					"Successes must be between 0 and the trials, not " + successes + " of " + trials);
		}
		double z = NormalQuantile.twoSided(level);
		if (trials == 0) {
			return new ConfidenceInterval(Double.NaN, Double.NaN, level);
		}
		double n = trials;
		double p = successes / n;
		double z2 = z * z;
		double centre = (p + z2 / (2 * n)) / (1 + z2 / n);
		double half = z * Math.sqrt(p * (1 - p) / n + z2 / (4 * n * n)) / (1 + z2 / n);
		double lower = (successes == 0) ? 0 : Math.max(0, centre - half);
		double upper = (successes == trials) ? 1 : Math.min(1, centre + half);
		return new ConfidenceInterval(lower, upper, level);
	}

}
