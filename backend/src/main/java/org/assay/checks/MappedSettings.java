package org.assay.checks;

/**
 * Thresholds of the already-on-the-map check ({@link FlagKind#MAPPED_ALREADY},
 * {@link FlagKind#EXTENDS_MAPPED}).
 *
 * @param enabled whether the check runs
 * @param bufferMetres how close to a mapped feature a stretch of the draft counts as
 * running along it (the default: 8 m)
 * @param fullShare the share of the draft's length along the mapped feature from which
 * the draft is a duplicate (default 0.9)
 * @param maxHausdorffMetres the largest directed discrete Hausdorff distance of a
 * duplicate: no vertex of the draft farther than this from the mapped feature (default 12
 * m, one and a half buffers: a vertex may stray a little beyond the buffer)
 * @param minAlongMetres the length along a mapped feature from which a draft that is not
 * a duplicate extends it (default 20 m, more than a road crossing at a shallow angle runs
 * within the buffer)
 */
public record MappedSettings(boolean enabled, double bufferMetres, double fullShare, double maxHausdorffMetres,
		double minAlongMetres) {

	/** The defaults. */
	public static final MappedSettings DEFAULTS = new MappedSettings(true, 8, 0.9, 12, 20);

	/**
	 * Checks the thresholds.
	 */
	public MappedSettings {
		Thresholds.positive("bufferMetres", bufferMetres);
		Thresholds.share("fullShare", fullShare);
		Thresholds.positive("maxHausdorffMetres", maxHausdorffMetres);
		Thresholds.positive("minAlongMetres", minAlongMetres);
	}

	/**
	 * The same thresholds, switched off.
	 * @return the settings, not enabled
	 */
	public MappedSettings off() {
		return new MappedSettings(false, this.bufferMetres, this.fullShare, this.maxHausdorffMetres,
				this.minAlongMetres);
	}

}
