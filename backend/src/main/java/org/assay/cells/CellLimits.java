package org.assay.cells;

/**
 * Limits on one cell of work.
 *
 * @param maxDrafts the most drafts a cell should hold
 * @param maxRoadMetres the most metres of road a cell should hold
 * @param minSideMetres a cell is never split below this side length
 */
public record CellLimits(int maxDrafts, double maxRoadMetres, double minSideMetres) {

	/** Defaults: 60 drafts, 15 km of road, 50 m minimum side. */
	public static final CellLimits DEFAULT = new CellLimits(60, 15_000, 50);

}
