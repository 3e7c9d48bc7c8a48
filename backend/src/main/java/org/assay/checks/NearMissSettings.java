package org.assay.checks;

/**
 * Thresholds of the near-miss check ({@link FlagKind#NEAR_MISS}).
 *
 * @param enabled whether the check runs
 * @param minGapMetres gaps below this are touching, not a miss (the default: 1 m)
 * @param maxGapMetres gaps above this are no miss (the default: 10 m)
 */
public record NearMissSettings(boolean enabled, double minGapMetres, double maxGapMetres) {

	/** The defaults. */
	public static final NearMissSettings DEFAULTS = new NearMissSettings(true, 1, 10);

	/**
	 * Checks the thresholds.
	 */
	public NearMissSettings {
		Thresholds.positive("minGapMetres", minGapMetres);
		Thresholds.positive("maxGapMetres", maxGapMetres);
		if (maxGapMetres <= minGapMetres) {
			throw new IllegalArgumentException("maxGapMetres must be more than minGapMetres");
		}
	}

	/**
	 * The same thresholds, switched off.
	 * @return the settings, not enabled
	 */
	public NearMissSettings off() {
		return new NearMissSettings(false, this.minGapMetres, this.maxGapMetres);
	}

}
