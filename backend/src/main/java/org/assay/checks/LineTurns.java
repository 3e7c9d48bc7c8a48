package org.assay.checks;

import java.util.List;

/**
 * The turn at each vertex of a line: the angle between the incoming and the outgoing
 * direction, 0° straight on, 180° straight back. Neighbours closer than a tolerance are
 * passed over, so that a repeated point does not hide the turn.
 */
final class LineTurns {

	private LineTurns() {
	}

	/** Adds a {@link FlagKind#SPIKE} when the sharpest turn exceeds the limit. */
	static void sharpest(LocalDraft d, double skipMetres, double limitDegrees, List<Flag> flags) {
		double sharpest = -1;
		int at = -1;
		for (int p = 0; p < d.parts(); p++) {
			int first = d.partStart(p), last = d.partEnd(p) - 1;
			for (int v = first + 1; v < last; v++) {
				int before = step(d, v, -1, first, skipMetres);
				int after = step(d, v, +1, last, skipMetres);
				if (before < 0 || after < 0) {
					continue;
				}
				double turn = turn(d, before, v, after);
				if (turn > sharpest) {
					sharpest = turn;
					at = v;
				}
			}
		}
		if (sharpest > limitDegrees) {
			flags.add(Flag.of(FlagKind.SPIKE)
				.value("turnDegrees", sharpest)
				.at(d.feature.lon(at), d.feature.lat(at))
				.build());
		}
	}

	/**
	 * The nearest vertex from v in a direction that is at least skipMetres away, or −1.
	 */
	private static int step(LocalDraft d, int v, int direction, int stop, double skipMetres) {
		for (int w = v + direction; direction < 0 ? w >= stop : w <= stop; w += direction) {
			if (Math.hypot(d.x[w] - d.x[v], d.y[w] - d.y[v]) >= Math.max(skipMetres, 1e-9)) {
				return w;
			}
		}
		return -1;
	}

	/** The turn at b from a to c, in degrees. */
	static double turn(LocalDraft d, int a, int b, int c) {
		double inX = d.x[b] - d.x[a], inY = d.y[b] - d.y[a];
		double outX = d.x[c] - d.x[b], outY = d.y[c] - d.y[b];
		return Math.toDegrees(Math.abs(Math.atan2(inX * outY - inY * outX, inX * outX + inY * outY)));
	}

}
