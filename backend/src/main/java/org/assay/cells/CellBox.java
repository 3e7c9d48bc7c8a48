package org.assay.cells;

/**
 * One cell of a plan: its box in longitude/latitude and what it holds.
 *
 * @param minX west
 * @param minY south
 * @param maxX east
 * @param maxY north
 * @param draftCount drafts in the cell, at least one
 * @param roadMetres metres of road in the cell
 * @param overLimit whether the cell exceeds a limit because it could not be split further
 */
public record CellBox(double minX, double minY, double maxX, double maxY, int draftCount, double roadMetres,
		boolean overLimit) {
}
