package org.assay.cells;

/**
 * Limits on one cell of work.
 *
 * <p>
 * A cell holding more than {@code maxDrafts} drafts or more than {@code maxRoadMetres} of
 * road is split, unless its halves would be shorter than {@code minSideMetres} or it
 * holds a single draft; see {@link CellSplitter}.
 *
 * @param maxDrafts the most drafts a cell should hold, at least one
 * @param maxRoadMetres the most metres of road a cell should hold, zero or more (infinity
 * for no limit)
 * @param minSideMetres a cell is never split below this side length, zero or more and
 * finite
 */
public record CellLimits(int maxDrafts, double maxRoadMetres, double minSideMetres) {

	/** Defaults: 60 drafts, 15 km of road, 50 m minimum side. */
	public static final CellLimits DEFAULT = new CellLimits(60, 15_000, 50);

	/**
	 * Checks the limits.
	 * @throws IllegalArgumentException if a limit is out of its range
	 */
	public CellLimits {
		if (maxDrafts < 1) {
			throw new IllegalArgumentException("maxDrafts must be at least 1, was " + maxDrafts);
		}
		if (!(maxRoadMetres >= 0)) {
			throw new IllegalArgumentException("maxRoadMetres must be zero or more, was " + maxRoadMetres);
		}
		if (!(minSideMetres >= 0) || Double.isInfinite(minSideMetres)) {
			throw new IllegalArgumentException("minSideMetres must be finite and zero or more, was " + minSideMetres);
		}
	}

}
