package org.assay.checks;

/**
 * Thresholds of the crossing check ({@link FlagKind#CROSSING_UNJOINED}).
 *
 * @param enabled whether the check runs
 * @param junctionMetres two roads that cross are joined when each has a vertex within
 * this distance of the crossing point (default 0.5 m)
 * @param endMetres a crossing within this distance of either road's end is an end that
 * overshoots the other road, not a crossing (default 2 m: drafted ends wander by a metre
 * or two; a longer overshoot is flagged)
 * @param minAngleDegrees roads that cross at a smaller angle run along each other rather
 * than across (default 20°): a draft of a mapped road, jittered by a metre, crosses it
 * every few segments at 2 to 5°; that is the already-on-the-map check's business
 */
public record CrossingSettings(boolean enabled, double junctionMetres, double endMetres, double minAngleDegrees) {

	/** The defaults. */
	public static final CrossingSettings DEFAULTS = new CrossingSettings(true, 0.5, 2, 20);

	/**
	 * Checks the thresholds.
	 */
	public CrossingSettings {
		Thresholds.positive("junctionMetres", junctionMetres);
		Thresholds.zeroOrMore("endMetres", endMetres);
		Thresholds.zeroOrMore("minAngleDegrees", minAngleDegrees);
		if (minAngleDegrees > 90) {
			throw new IllegalArgumentException("minAngleDegrees must be at most 90");
		}
	}

	/**
	 * The same thresholds, switched off.
	 * @return the settings, not enabled
	 */
	public CrossingSettings off() {
		return new CrossingSettings(false, this.junctionMetres, this.endMetres, this.minAngleDegrees);
	}

}
