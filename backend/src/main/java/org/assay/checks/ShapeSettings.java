package org.assay.checks;

/**
 * Thresholds of the road shape check ({@link FlagKind#SELF_CROSSING},
 * {@link FlagKind#REPEATED_POINT}, {@link FlagKind#SPIKE},
 * {@link FlagKind#SHORT_SEGMENT}, {@link FlagKind#SHORT_ROAD}). A limit of 0 switches its
 * own flag off.
 *
 * @param enabled whether the check runs
 * @param repeatedMetres consecutive vertices closer than this are one point repeated
 * (default 0.05 m: the files carry about 1 cm)
 * @param spikeDegrees a vertex where the line turns by more than this is a spike (0 =
 * straight on, 180 = straight back; default 150)
 * @param shortSegmentMetres segments shorter than this (and not repeated points) are
 * flagged (default 0.5 m)
 * @param minRoadMetres roads shorter than this in total are flagged (default 15 m)
 */
public record ShapeSettings(boolean enabled, double repeatedMetres, double spikeDegrees, double shortSegmentMetres,
		double minRoadMetres) {

	/** The defaults. */
	public static final ShapeSettings DEFAULTS = new ShapeSettings(true, 0.05, 150, 0.5, 15);

	/**
	 * Checks the thresholds.
	 */
	public ShapeSettings {
		Thresholds.zeroOrMore("repeatedMetres", repeatedMetres);
		Thresholds.zeroOrMore("spikeDegrees", spikeDegrees);
		Thresholds.zeroOrMore("shortSegmentMetres", shortSegmentMetres);
		Thresholds.zeroOrMore("minRoadMetres", minRoadMetres);
		if (spikeDegrees > 180) {
			throw new IllegalArgumentException("spikeDegrees must be at most 180");
		}
	}

	/**
	 * The same thresholds, switched off.
	 * @return the settings, not enabled
	 */
	public ShapeSettings off() {
		return new ShapeSettings(false, this.repeatedMetres, this.spikeDegrees, this.shortSegmentMetres,
				this.minRoadMetres);
	}

}
