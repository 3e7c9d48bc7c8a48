package org.assay.checks;

import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * Crossing without a junction: a road draft and another road (another draft, or a mapped
 * road) cross, and they share no vertex there.
 *
 * <p>
 * Two segments cross when each has its ends strictly on both sides of the other (JTS's
 * robust orientation predicate). A crossing is a junction when both roads have a vertex
 * within {@code junctionMetres} of the crossing point, and it is an overshooting end, not
 * a crossing, when it lies within {@code endMetres} of an end of either road (a road that
 * stops on another and runs a metre past it). Roads that meet at less than
 * {@code minAngleDegrees} run along each other and are left to the already-on-the-map
 * check. Crossings of a draft with itself are the shape check's
 * {@link FlagKind#SELF_CROSSING}.
 *
 * <p>
 * One {@link FlagKind#CROSSING_UNJOINED} per other road crossed, at the first crossing
 * found: the point, {@code angleDegrees} (the acute angle between the roads there, 0 to
 * 90) and the other road's id. Two drafts that cross are both flagged. A bridge is a
 * crossing without a junction too: the validator decides.
 */
final class CrossingCheck implements DraftCheck {

	private final CrossingSettings settings;

	CrossingCheck(CrossingSettings settings) {
		this.settings = settings;
	}

	@Override
	public String name() {
		return "crossing-unjoined";
	}

	@Override
	public void check(LocalDraft d, Neighbourhood around, List<Flag> flags) {
		if (!d.feature.isRoad()) {
			return;
		}
		Set<PackedFeature> crossed = new HashSet<>();
		for (NearbySegments near : new NearbySegments[] { around.drafts(), around.mapped() }) {
			for (int p = 0; p < d.parts(); p++) {
				for (int i = d.partStart(p) + 1; i < d.partEnd(p); i++) {
					for (int s = 0; s < near.size; s++) {
						if (!crossed.contains(near.owner[s]) && Planar.crossProperly(d.x[i - 1], d.y[i - 1], d.x[i],
								d.y[i], near.ax[s], near.ay[s], near.bx[s], near.by[s])) {
							Flag flag = unjoined(d, p, i, near, s);
							if (flag != null) {
								crossed.add(near.owner[s]);
								flags.add(flag);
							}
						}
					}
				}
			}
		}
	}

	private Flag unjoined(LocalDraft d, int part, int i, NearbySegments near, int s) {
		double t = Planar.crossingFraction(d.x[i - 1], d.y[i - 1], d.x[i], d.y[i], near.ax[s], near.ay[s], near.bx[s],
				near.by[s]);
		double cx = d.x[i - 1] + t * (d.x[i] - d.x[i - 1]);
		double cy = d.y[i - 1] + t * (d.y[i] - d.y[i - 1]);
		double tol = this.settings.junctionMetres();
		boolean draftVertex = near(cx, cy, d.x[i - 1], d.y[i - 1], tol) || near(cx, cy, d.x[i], d.y[i], tol);
		boolean otherVertex = near(cx, cy, near.ax[s], near.ay[s], tol) || near(cx, cy, near.bx[s], near.by[s], tol);
		double end = this.settings.endMetres();
		if ((draftVertex && otherVertex) || nearDraftEnd(d, part, cx, cy, end)
				|| nearOtherEnd(d, near, s, cx, cy, end)) {
			return null;
		}
		double a1 = Math.atan2(d.y[i] - d.y[i - 1], d.x[i] - d.x[i - 1]);
		double a2 = Math.atan2(near.by[s] - near.ay[s], near.bx[s] - near.ax[s]);
		double turn = Math.abs(Math.toDegrees(a1 - a2)) % 180;
		double angle = Math.min(turn, 180 - turn);
		if (angle < this.settings.minAngleDegrees()) {
			return null;
		}
		return Flag.of(FlagKind.CROSSING_UNJOINED)
			.value("angleDegrees", angle)
			.at(d.frame.lon(cx), d.frame.lat(cy))
			.other(near.owner[s].id)
			.build();
	}

	private static boolean nearDraftEnd(LocalDraft d, int part, double cx, double cy, double tol) {
		int first = d.partStart(part), last = d.partEnd(part) - 1;
		return near(cx, cy, d.x[first], d.y[first], tol) || near(cx, cy, d.x[last], d.y[last], tol);
	}

	private static boolean nearOtherEnd(LocalDraft d, NearbySegments near, int s, double cx, double cy, double tol) {
		PackedFeature other = near.owner[s];
		for (int p = 0; p < other.partEnds.length; p++) {
			int first = other.partStart(p), last = other.partEnds[p] - 1;
			if (near(cx, cy, d.frame.x(other.lon(first)), d.frame.y(other.lat(first)), tol)
					|| near(cx, cy, d.frame.x(other.lon(last)), d.frame.y(other.lat(last)), tol)) {
				return true;
			}
		}
		return false;
	}

	private static boolean near(double x1, double y1, double x2, double y2, double tol) {
		double dx = x2 - x1, dy = y2 - y1;
		return dx * dx + dy * dy <= tol * tol;
	}

}
