package org.assay.checks;

/**
 * Thresholds of the building check ({@link FlagKind#SMALL_BUILDING},
 * {@link FlagKind#BUILDING_OVERLAP}, {@link FlagKind#ROAD_THROUGH_BUILDING}). A limit of
 * 0 flags any amount.
 *
 * @param enabled whether the check runs
 * @param minAreaSquareMetres buildings with less area are flagged (default 6 m², a garden
 * shed)
 * @param minOverlapSquareMetres overlaps of two building drafts from this area on are
 * flagged (default 1 m², so that drafts that only touch along a wall are not)
 * @param minInsideMetres a road draft with this length or more inside a building draft is
 * flagged (default 1 m)
 */
public record BuildingSettings(boolean enabled, double minAreaSquareMetres, double minOverlapSquareMetres,
		double minInsideMetres) {

	/** The defaults. */
	public static final BuildingSettings DEFAULTS = new BuildingSettings(true, 6, 1, 1);

	/**
	 * Checks the thresholds.
	 */
	public BuildingSettings {
		Thresholds.zeroOrMore("minAreaSquareMetres", minAreaSquareMetres);
		Thresholds.zeroOrMore("minOverlapSquareMetres", minOverlapSquareMetres);
		Thresholds.zeroOrMore("minInsideMetres", minInsideMetres);
	}

	/**
	 * The same thresholds, switched off.
	 * @return the settings, not enabled
	 */
	public BuildingSettings off() {
		return new BuildingSettings(false, this.minAreaSquareMetres, this.minOverlapSquareMetres, this.minInsideMetres);
	}

}
