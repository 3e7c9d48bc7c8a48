package org.assay.imagery;

/**
 * Deterministic noise for the tiles: a hash of integer coordinates, and value noise
 * (bilinear interpolation of hashed lattice values with a smoothstep) anchored to the
 * projected world rather than to a tile, so that neighbouring tiles meet without a seam
 * and every tile is drawn the same each time.
 */
final class Noise {

	private Noise() {
	}

	/**
	 * A hash of three integers, uniform in [0, 1).
	 */
	static double hash(long a, long b, long c) {
		long h = a * 0x9E3779B97F4A7C15L + b * 0xC2B2AE3D27D4EB4FL + c * 0x165667B19E3779F9L;
		h ^= h >>> 33;
		h *= 0xFF51AFD7ED558CCDL;
		h ^= h >>> 33;
		h *= 0xC4CEB9FE1A85EC53L;
		h ^= h >>> 33;
		return (h >>> 11) * 0x1.0p-53;
	}

	/**
	 * Value noise at a point given in lattice units, in [0, 1).
	 */
	static double value(double x, double y, long seed) {
		long x0 = (long) Math.floor(x);
		long y0 = (long) Math.floor(y);
		double fx = smooth(x - x0);
		double fy = smooth(y - y0);
		double top = lerp(hash(x0, y0, seed), hash(x0 + 1, y0, seed), fx);
		double bottom = lerp(hash(x0, y0 + 1, seed), hash(x0 + 1, y0 + 1, seed), fx);
		return lerp(top, bottom, fy);
	}

	/**
	 * Tree crowns: one crown centre jittered inside each lattice cell, and the value at a
	 * point rising from 0 at a crown's rim to 1 at its centre (cellular noise of the
	 * nearest centre, in lattice units).
	 */
	static double crowns(double x, double y, long seed) {
		long cx = (long) Math.floor(x);
		long cy = (long) Math.floor(y);
		double nearest = Double.MAX_VALUE;
		for (long i = cx - 1; i <= cx + 1; i++) {
			for (long j = cy - 1; j <= cy + 1; j++) {
				double dx = i + hash(i, j, seed) - x;
				double dy = j + hash(j, i, seed + 1) - y;
				nearest = Math.min(nearest, dx * dx + dy * dy);
			}
		}
		return Math.max(0, 1 - Math.sqrt(nearest) / 0.8);
	}

	private static double smooth(double t) {
		return t * t * (3 - 2 * t);
	}

	private static double lerp(double a, double b, double t) {
		return a + (b - a) * t;
	}

}
