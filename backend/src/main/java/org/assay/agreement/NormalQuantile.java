package org.assay.agreement;

/**
 * The critical value z of the standard normal distribution for a two-sided confidence
 * level c, so that P(-z &lt; Z &lt; z) = c, that is z = &Phi;<sup>-1</sup>((1 + c) / 2).
 *
 * <p>
 * For c = 0.95 the value is the constant 1.959963984540054 (R's {@code qnorm(0.975)}).
 * Other levels are found by Newton's method on erf(y) = c with z = &radic;2&middot;y,
 * started at y = 0, where erf is concave so the iterates rise to the root without
 * overshooting. erf is summed from the series with positive terms (Abramowitz and Stegun
 * 1964, eq. 7.1.6, from memory): erf(y) = 2/&radic;&pi; &middot; e<sup>-y&sup2;</sup>
 * &middot; &Sigma;<sub>k&ge;0</sub> 2<sup>k</sup> y<sup>2k+1</sup> /
 * (1&middot;3&middot;&hellip;(2k+1)), which has no cancellation. The result is good to
 * about 1e-13 for levels up to 0.9999; beyond that the absolute error of erf near 1 grows
 * relative to the tail it leaves.
 */
final class NormalQuantile {

	/** z for a two-sided 95% level. */
	static final double Z95 = 1.959963984540054;

	private static final double TWO_OVER_ROOT_PI = 2 / Math.sqrt(Math.PI);

	private NormalQuantile() {
	}

	/**
	 * The two-sided critical value for a confidence level.
	 * @param level the confidence level, strictly between 0 and 1
	 * @return z &gt; 0
	 */
	static double twoSided(double level) {
		if (!(level > 0 && level < 1)) {
			throw new IllegalArgumentException("The confidence level must be between 0 and 1, not " + level);
		}
		if (level == 0.95) {
			return Z95;
		}
		double y = 0;
		for (int i = 0; i < 200; i++) {
			double step = (erf(y) - level) / (TWO_OVER_ROOT_PI * Math.exp(-y * y));
			y -= step;
			if (Math.abs(step) <= 1e-16 * y) {
				break;
			}
		}
		return Math.sqrt(2) * y;
	}

	static double erf(double y) {
		double term = y;
		double sum = y;
		for (int k = 1; k < 1000 && term > 1e-17 * sum; k++) {
			term *= 2 * y * y / (2 * k + 1);
			sum += term;
		}
		return TWO_OVER_ROOT_PI * Math.exp(-y * y) * sum;
	}

}
