package org.assay.agreement;

/**
 * The interpretation bands for kappa of Landis, J.R., Koch, G.G. (1977), The measurement
 * of observer agreement for categorical data, Biometrics 33:159-174: &lt; 0.00 poor,
 * 0.00-0.20 slight, 0.21-0.40 fair, 0.41-0.60 moderate, 0.61-0.80 substantial, 0.81-1.00
 * almost perfect. The authors call the bands arbitrary; they are labelled here as theirs,
 * not as a verdict of this application.
 *
 * <p>
 * The published ranges leave gaps at two decimals (0.20 | 0.21). The rule here: each
 * published upper bound belongs to its band, and any value above it belongs to the next,
 * so the bands are [0.00, 0.20], (0.20, 0.40], (0.40, 0.60], (0.60, 0.80] and (0.80,
 * 1.00]; 0.205 is fair, because it exceeds 0.20, the largest value the source calls
 * slight. Rounding to two decimals first was not chosen: it moves values by up to 0.005
 * and depends on how halves are rounded. Show kappa with three or more decimals beside
 * the band, or a value such as 0.203 (shown as 0.20) looks misplaced. A kappa computed
 * from counts can miss a bound by rounding error (0.2 as 0.20000000000000004), so values
 * within 1e-12 of a bound count as equal to it.
 */
public enum LandisKochBand {

	/** Below 0.00. */
	POOR("poor", 0.00),

	/** 0.00 to 0.20. */
	SLIGHT("slight", 0.20),

	/** Above 0.20 to 0.40. */
	FAIR("fair", 0.40),

	/** Above 0.40 to 0.60. */
	MODERATE("moderate", 0.60),

	/** Above 0.60 to 0.80. */
	SUBSTANTIAL("substantial", 0.80),

	/** Above 0.80 to 1.00. */
	ALMOST_PERFECT("almost perfect", 1.00);

	private static final double ROUNDING = 1e-12;

	private final String name;

	private final double upper;

	LandisKochBand(String name, double upper) {
		this.name = name;
		this.upper = upper;
	}

	/**
	 * The band of a kappa.
	 * @param kappa a kappa (or alpha), at most 1
	 * @return its band
	 * @throws IllegalArgumentException for NaN (an undefined kappa has no band) or a
	 * value above 1
	 */
	public static LandisKochBand of(double kappa) {
		if (Double.isNaN(kappa) || kappa > 1 + ROUNDING) {
			throw new IllegalArgumentException("Kappa " + kappa + " has no Landis-Koch band");
		}
		if (kappa < -ROUNDING) {
			return POOR;
		}
		for (LandisKochBand band : values()) {
			if (band != POOR && kappa <= band.upper + ROUNDING) {
				return band;
			}
		}
		return ALMOST_PERFECT;
	}

	/**
	 * @return the band's name as published, for example "fair"
	 */
	public String bandName() {
		return this.name;
	}

	/**
	 * @return the name with its source, for example "fair (Landis and Koch 1977)"
	 */
	public String label() {
		return this.name + " (Landis and Koch 1977)";
	}

}
