package org.assay.cells;

import java.util.ArrayList;
import java.util.List;

/**
 * Splits drafts into cells of work by an adaptive quadtree over their extent.
 *
 * <p>
 * Each draft is a point (longitude, latitude in WGS84 degrees: its representative point)
 * with a road length (zero for a building). The root box is the points' extent grown to a
 * square in local metres, with a side of at least {@link CellLimits#minSideMetres()}, so
 * a single point or a line of points still gets a proper box. A box is halved in both
 * directions, into four quadrants, while it holds more than
 * {@link CellLimits#maxDrafts()} drafts or more than {@link CellLimits#maxRoadMetres()}
 * of road, unless
 * <ul>
 * <li>it holds a single draft,</li>
 * <li>the quadrants' shorter side would be below {@link CellLimits#minSideMetres()},
 * measured with {@link LocalMetres} at the box's centre latitude (a sphere of the mean
 * radius, within 0.6% of the ellipsoid, and exact enough at the small sizes where the
 * rule bites), or</li>
 * <li>it is {@value #MAX_DEPTH} levels deep (a guard for a minimum side of zero).</li>
 * </ul>
 * Such a box that still breaks a limit becomes a cell marked {@link CellBox#overLimit()}:
 * a pile of drafts at one spot, or one very long road, is one over-limit cell.
 *
 * <p>
 * Every draft is in exactly one cell. The quadrants are half-open: a point on a dividing
 * line goes east of a north-south line and north of an east-west one; points on the
 * root's east and north edges belong to the quadrants touching them. Every draft lies in
 * the closed box of its cell. Cell boxes are the quadtree's boxes, not shrunk to their
 * drafts, so the cells tile the root without overlap; quadrants without drafts yield no
 * cell, so no cell is empty. Cells come in depth-first order, south-west, south-east,
 * north-west, north-east at each level (a Z-order sweep): nearby cells get nearby
 * indices, and the same input always gives the same plan.
 *
 * <p>
 * Cost: each level of the tree partitions the drafts in place, like a quicksort
 * partition, through one {@code int} permutation; with no per-draft objects the memory is
 * two {@code int}s per draft (the permutation and the result), and the time is
 * proportional to drafts times depth. Limits: a batch that crosses the antimeridian is
 * treated as spanning the globe's width (its cells still hold, but are shaped by the full
 * range); boxes near the poles are measured at their centre latitude.
 */
public final class CellSplitter {

	/** The deepest level that may still be split. */
	static final int MAX_DEPTH = 30;

	private final double[] x;

	private final double[] y;

	private final double[] road;

	private final CellLimits limits;

	private final int[] order;

	private final int[] cellOfDraft;

	private final List<CellBox> cells = new ArrayList<>();

	private final NodeStack stack = new NodeStack(3 * MAX_DEPTH + 4);

	private CellSplitter(double[] x, double[] y, double[] road, CellLimits limits) {
		this.x = x;
		this.y = y;
		this.road = road;
		this.limits = limits;
		this.order = new int[x.length];
		for (int i = 0; i < this.order.length; i++) {
			this.order[i] = i;
		}
		this.cellOfDraft = new int[x.length];
	}

	/**
	 * Splits drafts, each given by its representative point and its road length.
	 * @param x longitude of each draft's representative point, in [-180, 180]
	 * @param y latitude of each draft's representative point, in [-90, 90]
	 * @param roadMetres road length of each draft in metres (0 for buildings)
	 * @param limits the limits
	 * @return the plan; with no drafts, a plan with no cells
	 * @throws IllegalArgumentException if the arrays differ in length or a value is NaN,
	 * infinite or out of range (the message names the index)
	 */
	public static CellPlan split(double[] x, double[] y, double[] roadMetres, CellLimits limits) {
		DraftInput.check(x, y, roadMetres);
		if (limits == null) {
			throw new IllegalArgumentException("limits are required");
		}
		if (x.length == 0) {
			return new CellPlan(List.of(), new int[0]);
		}
		return new CellSplitter(x, y, roadMetres, limits).run();
	}

	private CellPlan run() {
		double[] root = DraftInput.rootBox(this.x, this.y, this.limits.minSideMetres());
		this.stack.push(0, this.order.length, 0, root[0], root[1], root[2], root[3]);
		while (!this.stack.isEmpty()) {
			this.stack.pop();
			visit(this.stack.start, this.stack.end, this.stack.depth, this.stack.minX, this.stack.minY, this.stack.maxX,
					this.stack.maxY);
		}
		return new CellPlan(this.cells, this.cellOfDraft);
	}

	private void visit(int start, int end, int depth, double minX, double minY, double maxX, double maxY) {
		int count = end - start;
		boolean splittable = canSplit(count, depth, minX, minY, maxX, maxY);
		if (splittable && count > this.limits.maxDrafts()) {
			divide(start, end, depth, minX, minY, maxX, maxY);
			return;
		}
		double roadMetres = roadSum(start, end);
		if (splittable && roadMetres > this.limits.maxRoadMetres()) {
			divide(start, end, depth, minX, minY, maxX, maxY);
			return;
		}
		boolean overLimit = count > this.limits.maxDrafts() || roadMetres > this.limits.maxRoadMetres();
		int cell = this.cells.size();
		this.cells.add(new CellBox(minX, minY, maxX, maxY, count, roadMetres, overLimit));
		for (int i = start; i < end; i++) {
			this.cellOfDraft[this.order[i]] = cell;
		}
	}

	private boolean canSplit(int count, int depth, double minX, double minY, double maxX, double maxY) {
		double midX = (minX + maxX) / 2;
		double midY = (minY + maxY) / 2;
		return count > 1 && depth < MAX_DEPTH && minX < midX && midX < maxX && minY < midY && midY < maxY
				&& LocalMetres.shorterSide(minX, minY, maxX, maxY) / 2 >= this.limits.minSideMetres();
	}

	// Children are pushed in reverse so that they are visited south-west first (Z-order).
	private void divide(int start, int end, int depth, double minX, double minY, double maxX, double maxY) {
		double midX = (minX + maxX) / 2;
		double midY = (minY + maxY) / 2;
		int north = partition(this.y, start, end, midY);
		int southEast = partition(this.x, start, north, midX);
		int northEast = partition(this.x, north, end, midX);
		int next = depth + 1;
		pushIfAny(northEast, end, next, midX, midY, maxX, maxY);
		pushIfAny(north, northEast, next, minX, midY, midX, maxY);
		pushIfAny(southEast, north, next, midX, minY, maxX, midY);
		pushIfAny(start, southEast, next, minX, minY, midX, midY);
	}

	private void pushIfAny(int start, int end, int depth, double minX, double minY, double maxX, double maxY) {
		if (end > start) {
			this.stack.push(start, end, depth, minX, minY, maxX, maxY);
		}
	}

	/**
	 * Reorders {@code order[start, end)} so that drafts whose coordinate is below
	 * {@code split} come first (Hoare's scheme).
	 * @return the index of the first draft at or above {@code split}
	 */
	private int partition(double[] coordinate, int start, int end, double split) {
		int[] order = this.order;
		int low = start;
		int high = end - 1;
		while (true) {
			while (low <= high && coordinate[order[low]] < split) {
				low++;
			}
			while (low <= high && coordinate[order[high]] >= split) {
				high--;
			}
			if (low >= high) {
				return low;
			}
			int swap = order[low];
			order[low++] = order[high];
			order[high--] = swap;
		}
	}

	private double roadSum(int start, int end) {
		double sum = 0;
		for (int i = start; i < end; i++) {
			sum += this.road[this.order[i]];
		}
		return sum;
	}

}
