package org.assay.checks;

import java.util.List;

/**
 * Shape faults of a road draft, each measured in the draft's frame on its own vertices:
 * <ul>
 * <li>{@link FlagKind#SELF_CROSSING}: two segments of the draft that are not neighbours
 * cross (robust predicate, see {@link Planar#crossProperly}); {@code crossings}, at the
 * first.</li>
 * <li>{@link FlagKind#REPEATED_POINT}: consecutive vertices closer than
 * {@code repeatedMetres}; {@code count}, at the first.</li>
 * <li>{@link FlagKind#SPIKE}: a vertex where the line turns by more than
 * {@code spikeDegrees} (the angle between the incoming and the outgoing direction;
 * repeated points are skipped, so a spike hidden behind one is still seen);
 * {@code turnDegrees} of the sharpest, at it.</li>
 * <li>{@link FlagKind#SHORT_SEGMENT}: segments shorter than {@code shortSegmentMetres}
 * but not repeated points; {@code count} and {@code shortestMetres} (geodesic), at the
 * shortest's middle.</li>
 * <li>{@link FlagKind#SHORT_ROAD}: total length under {@code minRoadMetres};
 * {@code lengthMetres} (geodesic).</li>
 * </ul>
 * Self-crossing compares all pairs of segments, after a box test: quadratic, which for
 * the 10 to 30 segments of a drafted road is cheaper than building a sweep.
 */
final class LineShapeCheck implements DraftCheck {

	private final ShapeSettings settings;

	LineShapeCheck(ShapeSettings settings) {
		this.settings = settings;
	}

	@Override
	public String name() {
		return "shape";
	}

	@Override
	public void check(LocalDraft d, Neighbourhood near, List<Flag> flags) {
		if (!d.feature.isRoad()) {
			return;
		}
		selfCrossing(d, flags);
		segments(d, flags);
		if (this.settings.spikeDegrees() > 0) {
			LineTurns.sharpest(d, this.settings.repeatedMetres(), this.settings.spikeDegrees(), flags);
		}
		if (d.frameLength() < this.settings.minRoadMetres()) {
			flags.add(Flag.of(FlagKind.SHORT_ROAD).value("lengthMetres", Geodesics.length(d.feature)).build());
		}
	}

	private void selfCrossing(LocalDraft d, List<Flag> flags) {
		int crossings = 0;
		double firstX = 0, firstY = 0;
		int n = d.x.length;
		for (int i = 1; i < n; i++) {
			if (isGap(d, i)) {
				continue;
			}
			for (int j = i + 2; j < n; j++) {
				if (isGap(d, j) || closesRing(d, i, j)) {
					continue;
				}
				if (Planar.crossProperly(d.x[i - 1], d.y[i - 1], d.x[i], d.y[i], d.x[j - 1], d.y[j - 1], d.x[j],
						d.y[j])) {
					if (crossings++ == 0) {
						double t = Planar.crossingFraction(d.x[i - 1], d.y[i - 1], d.x[i], d.y[i], d.x[j - 1],
								d.y[j - 1], d.x[j], d.y[j]);
						firstX = d.x[i - 1] + t * (d.x[i] - d.x[i - 1]);
						firstY = d.y[i - 1] + t * (d.y[i] - d.y[i - 1]);
					}
				}
			}
		}
		if (crossings > 0) {
			flags.add(Flag.of(FlagKind.SELF_CROSSING)
				.value("crossings", crossings)
				.at(d.frame.lon(firstX), d.frame.lat(firstY))
				.build());
		}
	}

	/** Whether vertex i starts a part, so (i−1, i) is no segment. */
	private static boolean isGap(LocalDraft d, int i) {
		for (int p = 1; p < d.parts(); p++) {
			if (d.partStart(p) == i) {
				return true;
			}
		}
		return false;
	}

	/** Whether segments ending at i and j are the first and last of one closed part. */
	private static boolean closesRing(LocalDraft d, int i, int j) {
		for (int p = 0; p < d.parts(); p++) {
			int first = d.partStart(p), last = d.partEnd(p) - 1;
			if (i == first + 1 && j == last && d.x[first] == d.x[last] && d.y[first] == d.y[last]) {
				return true;
			}
		}
		return false;
	}

	private void segments(LocalDraft d, List<Flag> flags) {
		int repeated = 0, shortOnes = 0, shortest = -1, firstRepeated = -1;
		double shortestLength = Double.POSITIVE_INFINITY;
		for (int i = 1; i < d.x.length; i++) {
			if (isGap(d, i)) {
				continue;
			}
			double length = Math.hypot(d.x[i] - d.x[i - 1], d.y[i] - d.y[i - 1]);
			if (length < this.settings.repeatedMetres()) {
				firstRepeated = (repeated++ == 0) ? i : firstRepeated;
			}
			else if (length < this.settings.shortSegmentMetres()) {
				shortOnes++;
				if (length < shortestLength) {
					shortestLength = length;
					shortest = i;
				}
			}
		}
		if (repeated > 0) {
			flags.add(Flag.of(FlagKind.REPEATED_POINT)
				.value("count", repeated)
				.at(d.feature.lon(firstRepeated), d.feature.lat(firstRepeated))
				.build());
		}
		if (shortOnes > 0) {
			int i = shortest;
			flags.add(Flag.of(FlagKind.SHORT_SEGMENT)
				.value("count", shortOnes)
				.value("shortestMetres", d.geodesicDistance(d.x[i - 1], d.y[i - 1], d.x[i], d.y[i]))
				.at(d.frame.lon((d.x[i - 1] + d.x[i]) / 2), d.frame.lat((d.y[i - 1] + d.y[i]) / 2))
				.build());
		}
	}

}
