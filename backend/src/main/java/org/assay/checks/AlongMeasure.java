package org.assay.checks;

import java.util.Arrays;

/**
 * How much of a draft runs within a buffer of nearby segments: for each segment of the
 * draft, the part within the buffer of each nearby segment is an interval (the segment
 * meets a capsule, which is convex; see {@link Planar#withinInterval}); the intervals are
 * merged, so overlapping nearby features count once. Exact in the frame, not sampled.
 * Also finds the longest covered run, and where it ends inside the draft: the point where
 * a draft that extends a mapped feature leaves it.
 */
final class AlongMeasure {

	/** Frame metres of the draft within the buffer. */
	final double covered;

	/** Frame metres of the whole draft. */
	final double total;

	/**
	 * Where the longest covered run leaves the draft's interior, in frame metres from the
	 * start; NaN if nowhere.
	 */
	final double leaveAt;

	private AlongMeasure(double covered, double total, double leaveAt) {
		this.covered = covered;
		this.total = total;
		this.leaveAt = leaveAt;
	}

	double share() {
		return (this.total > 0) ? this.covered / this.total : 0;
	}

	static AlongMeasure measure(LocalDraft d, NearbySegments near, double buffer) {
		double covered = 0;
		double at = 0;
		double runStart = Double.NaN, runEnd = Double.NaN, bestStart = 0, bestEnd = 0;
		double[] t = new double[2];
		double[] starts = new double[8];
		double[] ends = new double[8];
		for (int p = 0; p < d.parts(); p++) {
			for (int i = d.partStart(p) + 1; i < d.partEnd(p); i++) {
				double px = d.x[i - 1], py = d.y[i - 1], qx = d.x[i], qy = d.y[i];
				double length = Math.hypot(qx - px, qy - py);
				double minX = Math.min(px, qx) - buffer, maxX = Math.max(px, qx) + buffer;
				double minY = Math.min(py, qy) - buffer, maxY = Math.max(py, qy) + buffer;
				int n = 0;
				for (int s = 0; s < near.size; s++) {
					if (Math.max(near.ax[s], near.bx[s]) < minX || Math.min(near.ax[s], near.bx[s]) > maxX
							|| Math.max(near.ay[s], near.by[s]) < minY || Math.min(near.ay[s], near.by[s]) > maxY) {
						continue;
					}
					if (Planar.withinInterval(px, py, qx, qy, near.ax[s], near.ay[s], near.bx[s], near.by[s], buffer,
							t)) {
						if (n == starts.length) {
							starts = Arrays.copyOf(starts, 2 * n);
							ends = Arrays.copyOf(ends, 2 * n);
						}
						starts[n] = t[0];
						ends[n++] = t[1];
					}
				}
				if (n == 0) {
					at += length;
					continue;
				}
				double[][] merged = merge(starts, ends, n);
				for (int k = 0; k < merged[0].length; k++) {
					double a = at + merged[0][k] * length, b = at + merged[1][k] * length;
					covered += b - a;
					if (!(a <= runEnd + 1e-9)) {
						runStart = a;
					}
					runEnd = b;
					if (runEnd - runStart > bestEnd - bestStart) {
						bestStart = runStart;
						bestEnd = runEnd;
					}
				}
				at += length;
			}
		}
		double leave = (bestEnd - bestStart <= 0) ? Double.NaN
				: (bestEnd < at - 1e-6) ? bestEnd : (bestStart > 1e-6) ? bestStart : Double.NaN;
		return new AlongMeasure(covered, at, leave);
	}

	/**
	 * Merges intervals: {starts, ends} sorted and disjoint. Insertion sort: n is small.
	 */
	private static double[][] merge(double[] starts, double[] ends, int n) {
		for (int i = 1; i < n; i++) {
			double s = starts[i], e = ends[i];
			int j = i - 1;
			while (j >= 0 && starts[j] > s) {
				starts[j + 1] = starts[j];
				ends[j + 1] = ends[j];
				j--;
			}
			starts[j + 1] = s;
			ends[j + 1] = e;
		}
		double[] ms = new double[n], me = new double[n];
		int m = 0;
		for (int i = 0; i < n; i++) {
			if (m > 0 && starts[i] <= me[m - 1]) {
				me[m - 1] = Math.max(me[m - 1], ends[i]);
			}
			else {
				ms[m] = starts[i];
				me[m++] = ends[i];
			}
		}
		return new double[][] { Arrays.copyOf(ms, m), Arrays.copyOf(me, m) };
	}

	/** The frame point at a distance from the draft's start, {x, y}. */
	static double[] pointAt(LocalDraft d, double distance) {
		double at = 0;
		for (int p = 0; p < d.parts(); p++) {
			for (int i = d.partStart(p) + 1; i < d.partEnd(p); i++) {
				double length = Math.hypot(d.x[i] - d.x[i - 1], d.y[i] - d.y[i - 1]);
				if (at + length >= distance && length > 0) {
					double f = (distance - at) / length;
					return new double[] { d.x[i - 1] + f * (d.x[i] - d.x[i - 1]),
							d.y[i - 1] + f * (d.y[i] - d.y[i - 1]) };
				}
				at += length;
			}
		}
		return new double[] { d.x[d.x.length - 1], d.y[d.y.length - 1] };
	}

}
