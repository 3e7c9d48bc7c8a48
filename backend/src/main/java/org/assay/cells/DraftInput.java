package org.assay.cells;

import java.util.Objects;

/**
 * Checks the splitter's input and finds the root box of the quadtree.
 */
final class DraftInput {

	private DraftInput() {
	}

	/**
	 * Checks that the arrays have one length and hold usable values.
	 * @param x longitudes, each in [-180, 180]
	 * @param y latitudes, each in [-90, 90]
	 * @param roadMetres road lengths, each finite and zero or more
	 * @throws IllegalArgumentException naming the first bad index
	 */
	static void check(double[] x, double[] y, double[] roadMetres) {
		Objects.requireNonNull(x, "x");
		Objects.requireNonNull(y, "y");
		Objects.requireNonNull(roadMetres, "roadMetres");
		if (x.length != y.length || x.length != roadMetres.length) {
			throw new IllegalArgumentException(
					"arrays differ in length: x " + x.length + ", y " + y.length + ", roadMetres " + roadMetres.length);
		}
		for (int i = 0; i < x.length; i++) {
			checkIn("x", i, x[i], 180);
			checkIn("y", i, y[i], 90);
			if (!(roadMetres[i] >= 0) || Double.isInfinite(roadMetres[i])) {
				throw new IllegalArgumentException(
						"roadMetres[" + i + "] = " + roadMetres[i] + " is not a finite length of zero or more");
			}
		}
	}

	private static void checkIn(String name, int i, double value, double bound) {
		if (!(value >= -bound && value <= bound)) {
			throw new IllegalArgumentException(
					name + "[" + i + "] = " + value + " is not in [-" + (int) bound + ", " + (int) bound + "]");
		}
	}

	/**
	 * The root box: the points' extent grown to a square, in local metres at its centre
	 * latitude, whose side is at least {@code minSideMetres}, then shifted (or, if wider
	 * than the globe, clipped) to stay within [-180, 180] x [-90, 90]. A square root
	 * keeps every quadrant roughly square, so a long thin spread of drafts is not cut
	 * into slivers.
	 * @param x longitudes, at least one
	 * @param y latitudes
	 * @param minSideMetres the minimum side
	 * @return {minX, minY, maxX, maxY}, containing every point
	 */
	static double[] rootBox(double[] x, double[] y, double minSideMetres) {
		double minX = x[0], maxX = x[0], minY = y[0], maxY = y[0];
		for (int i = 1; i < x.length; i++) {
			minX = Math.min(minX, x[i]);
			maxX = Math.max(maxX, x[i]);
			minY = Math.min(minY, y[i]);
			maxY = Math.max(maxY, y[i]);
		}
		double centreX = (minX + maxX) / 2;
		double centreY = (minY + maxY) / 2;
		double perDegreeX = LocalMetres.metresPerDegreeLongitude(centreY);
		double side = Math.max(minSideMetres,
				Math.max((maxX - minX) * perDegreeX, (maxY - minY) * LocalMetres.METRES_PER_DEGREE));
		double halfWidth = (perDegreeX > 0) ? side / perDegreeX / 2 : 180;
		double halfHeight = side / LocalMetres.METRES_PER_DEGREE / 2;
		double[] xs = fit(Math.min(centreX - halfWidth, minX), Math.max(centreX + halfWidth, maxX), 180);
		double[] ys = fit(Math.min(centreY - halfHeight, minY), Math.max(centreY + halfHeight, maxY), 90);
		return new double[] { xs[0], ys[0], xs[1], ys[1] };
	}

	// Shifting keeps the span (and so the points) inside, since the points are in range.
	private static double[] fit(double low, double high, double bound) {
		if (high > bound) {
			low -= high - bound;
			high = bound;
		}
		else if (low < -bound) {
			high += -bound - low;
			low = -bound;
		}
		return new double[] { Math.max(low, -bound), Math.min(high, bound) };
	}

}
