package org.assay.checks;

import org.locationtech.jts.algorithm.CGAlgorithmsDD;

/**
 * Plane geometry on bare coordinates in a {@link MetricFrame}, without allocating: the
 * checks run it millions of times. Orientation tests use JTS's robust double-double
 * predicate, so that whether two segments cross does not depend on rounding.
 */
final class Planar {

	private Planar() {
	}

	/** The squared distance from a point to a segment. */
	static double pointSegmentDistanceSq(double px, double py, double ax, double ay, double bx, double by) {
		double t = closestFraction(px, py, ax, ay, bx, by);
		double dx = ax + t * (bx - ax) - px;
		double dy = ay + t * (by - ay) - py;
		return dx * dx + dy * dy;
	}

	/** Where along a segment, from 0 at a to 1 at b, the point nearest to p lies. */
	static double closestFraction(double px, double py, double ax, double ay, double bx, double by) {
		double vx = bx - ax;
		double vy = by - ay;
		double len2 = vx * vx + vy * vy;
		if (len2 == 0) {
			return 0;
		}
		double t = ((px - ax) * vx + (py - ay) * vy) / len2;
		return (t < 0) ? 0 : (t > 1) ? 1 : t;
	}

	/**
	 * The part of segment pq, as fractions {@code [t0, t1]} of its length, that lies
	 * within distance r of segment ab: the intersection of pq with the capsule (the
	 * segment ab grown by r), which is convex, so the part is one interval. It is the
	 * hull of pq's intersections with the two end discs and the rectangle between them.
	 * @param out receives t0 and t1
	 * @return whether any part of pq is within r
	 */
	static boolean withinInterval(double px, double py, double qx, double qy, double ax, double ay, double bx,
			double by, double r, double[] out) {
		double lo = Double.POSITIVE_INFINITY;
		double hi = Double.NEGATIVE_INFINITY;
		double[] tmp = new double[2];
		if (discInterval(px, py, qx, qy, ax, ay, r, tmp)) {
			lo = tmp[0];
			hi = tmp[1];
		}
		if (discInterval(px, py, qx, qy, bx, by, r, tmp)) {
			lo = Math.min(lo, tmp[0]);
			hi = Math.max(hi, tmp[1]);
		}
		if (rectangleInterval(px, py, qx, qy, ax, ay, bx, by, r, tmp)) {
			lo = Math.min(lo, tmp[0]);
			hi = Math.max(hi, tmp[1]);
		}
		out[0] = lo;
		out[1] = hi;
		return lo <= hi;
	}

	private static boolean discInterval(double px, double py, double qx, double qy, double cx, double cy, double r,
			double[] out) {
		double dx = qx - px;
		double dy = qy - py;
		double fx = px - cx;
		double fy = py - cy;
		double a = dx * dx + dy * dy;
		double c = fx * fx + fy * fy - r * r;
		if (a == 0) {
			out[0] = 0;
			out[1] = 1;
			return c <= 0;
		}
		double b = fx * dx + fy * dy;
		double disc = b * b - a * c;
		if (disc < 0) {
			return false;
		}
		double root = Math.sqrt(disc);
		return clip((-b - root) / a, (-b + root) / a, out);
	}

	/** Clips pq to the rectangle {0 ≤ u ≤ |ab|, |v| ≤ r} in ab's own axes. */
	private static boolean rectangleInterval(double px, double py, double qx, double qy, double ax, double ay,
			double bx, double by, double r, double[] out) {
		double len = Math.hypot(bx - ax, by - ay);
		if (len == 0) {
			return false;
		}
		double ux = (bx - ax) / len;
		double uy = (by - ay) / len;
		double pu = (px - ax) * ux + (py - ay) * uy;
		double pv = -(px - ax) * uy + (py - ay) * ux;
		double du = (qx - px) * ux + (qy - py) * uy;
		double dv = -(qx - px) * uy + (qy - py) * ux;
		double[] range = { 0, 1 };
		return slab(pu, du, 0, len, range) && slab(pv, dv, -r, r, range) && clip(range[0], range[1], out);
	}

	private static boolean slab(double start, double step, double min, double max, double[] range) {
		if (step == 0) {
			return start >= min && start <= max;
		}
		double t0 = (min - start) / step;
		double t1 = (max - start) / step;
		range[0] = Math.max(range[0], Math.min(t0, t1));
		range[1] = Math.min(range[1], Math.max(t0, t1));
		return range[0] <= range[1];
	}

	private static boolean clip(double t0, double t1, double[] out) {
		out[0] = Math.max(0, t0);
		out[1] = Math.min(1, t1);
		return out[0] <= out[1];
	}

	/**
	 * Whether segments ab and cd cross at a point inside both: each has its ends strictly
	 * on opposite sides of the other. Touching at an end, or lying on one line, is not
	 * crossing.
	 */
	static boolean crossProperly(double ax, double ay, double bx, double by, double cx, double cy, double dx,
			double dy) {
		if (Math.max(ax, bx) < Math.min(cx, dx) || Math.max(cx, dx) < Math.min(ax, bx)
				|| Math.max(ay, by) < Math.min(cy, dy) || Math.max(cy, dy) < Math.min(ay, by)) {
			return false;
		}
		int c = CGAlgorithmsDD.orientationIndex(ax, ay, bx, by, cx, cy);
		int d = CGAlgorithmsDD.orientationIndex(ax, ay, bx, by, dx, dy);
		if (c == 0 || d == 0 || c == d) {
			return false;
		}
		int a = CGAlgorithmsDD.orientationIndex(cx, cy, dx, dy, ax, ay);
		int b = CGAlgorithmsDD.orientationIndex(cx, cy, dx, dy, bx, by);
		return a != 0 && b != 0 && a != b;
	}

	/**
	 * Where along ab, as a fraction, the line through cd meets it; for segments known to
	 * cross.
	 */
	static double crossingFraction(double ax, double ay, double bx, double by, double cx, double cy, double dx,
			double dy) {
		double rx = bx - ax;
		double ry = by - ay;
		double sx = dx - cx;
		double sy = dy - cy;
		double denominator = rx * sy - ry * sx;
		return ((cx - ax) * sy - (cy - ay) * sx) / denominator;
	}

	/** The squared distance between segments ab and cd. */
	static double segmentDistanceSq(double ax, double ay, double bx, double by, double cx, double cy, double dx,
			double dy) {
		if (crossProperly(ax, ay, bx, by, cx, cy, dx, dy)) {
			return 0;
		}
		return Math.min(
				Math.min(pointSegmentDistanceSq(ax, ay, cx, cy, dx, dy),
						pointSegmentDistanceSq(bx, by, cx, cy, dx, dy)),
				Math.min(pointSegmentDistanceSq(cx, cy, ax, ay, bx, by),
						pointSegmentDistanceSq(dx, dy, ax, ay, bx, by)));
	}

}
