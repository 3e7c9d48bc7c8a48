package org.assay.checks;

/**
 * The directed discrete Hausdorff distance from a draft's vertices to nearby segments:
 * the largest, over the vertices, of the distance to the nearest segment. Directed,
 * because a draft that duplicates a stretch of a long mapped road is a duplicate although
 * the road runs on: the reverse direction would measure the rest of the road. Discrete,
 * because it looks at vertices only: between two vertices the draft may stray farther,
 * which the share along the buffer (see {@link AlongMeasure}) sees.
 *
 * <p>
 * With a limit it exits early, the way PERFORMANCE-NOTES.md asks: it stops at the first
 * vertex that is farther than the limit from every segment, and for each vertex it stops
 * scanning segments at the first one no farther than the largest distance found so far
 * (that vertex cannot raise the maximum; Taha and Hanbury, "An efficient algorithm for
 * calculating the exact Hausdorff distance", IEEE TPAMI 37 (2015) 2153-2163, use the same
 * break).
 */
final class DirectedHausdorff {

	/** The distance in the frame, or infinity when over the limit. */
	final double distance;

	/** The vertex that is farthest, or −1. */
	final int vertex;

	/** The segment nearest to that vertex, or −1. */
	final int segment;

	private DirectedHausdorff(double distance, int vertex, int segment) {
		this.distance = distance;
		this.vertex = vertex;
		this.segment = segment;
	}

	/**
	 * Measures with a limit.
	 * @param draft the draft
	 * @param near the segments to measure to, at least one
	 * @param limit beyond this the exact value is not needed: the result is infinite
	 * @return the distance and its witnesses
	 */
	static DirectedHausdorff measure(LocalDraft draft, NearbySegments near, double limit) {
		double limitSq = limit * limit;
		double maxSq = -1;
		int worst = -1;
		for (int v = 0; v < draft.x.length; v++) {
			double px = draft.x[v], py = draft.y[v];
			double minSq = Double.POSITIVE_INFINITY;
			for (int s = 0; s < near.size; s++) {
				double d = Planar.pointSegmentDistanceSq(px, py, near.ax[s], near.ay[s], near.bx[s], near.by[s]);
				if (d < minSq) {
					minSq = d;
					if (d <= maxSq) {
						break;
					}
				}
			}
			if (minSq > limitSq) {
				return new DirectedHausdorff(Double.POSITIVE_INFINITY, v, -1);
			}
			if (minSq > maxSq) {
				maxSq = minSq;
				worst = v;
			}
		}
		return new DirectedHausdorff(Math.sqrt(maxSq), worst, near.nearest(draft.x[worst], draft.y[worst]));
	}

	boolean withinLimit() {
		return this.distance != Double.POSITIVE_INFINITY;
	}

	/**
	 * The distance measured again on the ellipsoid, between the witness vertex and its
	 * nearest point.
	 */
	double geodesic(LocalDraft draft, NearbySegments near) {
		double px = draft.x[this.vertex], py = draft.y[this.vertex];
		int s = this.segment;
		double t = Planar.closestFraction(px, py, near.ax[s], near.ay[s], near.bx[s], near.by[s]);
		return draft.geodesicDistance(px, py, near.ax[s] + t * (near.bx[s] - near.ax[s]),
				near.ay[s] + t * (near.by[s] - near.ay[s]));
	}

}
