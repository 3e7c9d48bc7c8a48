package org.assay.checks;

/**
 * Thresholds of the crossing check ({@link FlagKind#CROSSING_UNJOINED}).
 *
 * @param enabled whether the check runs
 * @param junctionMetres two roads that cross are joined when each has a vertex within
 * this distance of the crossing point (default 0.5 m); a crossing within this distance of
 * either road's end is a touching end, not a crossing
 */
public record CrossingSettings(boolean enabled, double junctionMetres) {

	/** The defaults. */
	public static final CrossingSettings DEFAULTS = new CrossingSettings(true, 0.5);

	/**
	 * Checks the thresholds.
	 */
	public CrossingSettings {
		Thresholds.positive("junctionMetres", junctionMetres);
	}

	/**
	 * The same thresholds, switched off.
	 * @return the settings, not enabled
	 */
	public CrossingSettings off() {
		return new CrossingSettings(false, this.junctionMetres);
	}

}
