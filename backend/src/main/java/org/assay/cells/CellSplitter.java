package org.assay.cells;

/**
 * Splits drafts into cells by an adaptive quadtree over their extent.
 *
 * <p>
 * STUB: to be implemented.
 */
public final class CellSplitter {

	private CellSplitter() {
	}

	/**
	 * Splits drafts, each given by its representative point and its road length.
	 * @param x longitude of each draft's representative point
	 * @param y latitude of each draft's representative point
	 * @param roadMetres road length of each draft in metres (0 for buildings)
	 * @param limits the limits
	 * @return the plan
	 */
	public static CellPlan split(double[] x, double[] y, double[] roadMetres, CellLimits limits) {
		throw new UnsupportedOperationException("not yet");
	}

}
