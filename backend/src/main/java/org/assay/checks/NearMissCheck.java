package org.assay.checks;

import java.util.List;

/**
 * Near miss: a road draft's end lies between {@code minGapMetres} and
 * {@code maxGapMetres} from another road (another draft, or a mapped road) and the draft
 * touches that road nowhere: the model stopped short of a junction.
 *
 * <p>
 * For each end of each part of the draft (a closed part has no end), the road segments of
 * the draft's {@link Neighbourhood} whose boxes come within {@code maxGapMetres} of the
 * end are measured in the draft's frame; the nearest decides. An end closer than
 * {@code minGapMetres} to any road touches it and is no miss (the scan stops there); an
 * end farther than {@code maxGapMetres} from all is free. For a miss, the draft's
 * segments are measured against the other road's, stopping at the first pair that
 * touches. Parts of the same draft are not "another road". The neighbourhood is gathered
 * once per draft from the indexes (PERFORMANCE-NOTES.md: one query per end per index was
 * the slow, obvious way).
 *
 * <p>
 * One {@link FlagKind#NEAR_MISS} per end: {@code gapMetres} (geodesic, GeographicLib),
 * the point to join (the nearest point of the other road) and the other road's id.
 */
final class NearMissCheck implements DraftCheck {

	private final NearMissSettings settings;

	NearMissCheck(NearMissSettings settings) {
		this.settings = settings;
	}

	@Override
	public String name() {
		return "near-miss";
	}

	/** How far from the draft other roads matter. */
	double reach() {
		return this.settings.maxGapMetres();
	}

	@Override
	public void check(LocalDraft draft, Neighbourhood near, List<Flag> flags) {
		if (!draft.feature.isRoad()) {
			return;
		}
		for (int p = 0; p < draft.parts(); p++) {
			int first = draft.partStart(p);
			int last = draft.partEnd(p) - 1;
			if (last == first || (draft.x[first] == draft.x[last] && draft.y[first] == draft.y[last])) {
				continue;
			}
			end(draft, first, near, flags);
			end(draft, last, near, flags);
		}
	}

	private void end(LocalDraft draft, int vertex, Neighbourhood around, List<Flag> flags) {
		double px = draft.x[vertex], py = draft.y[vertex];
		Nearest nearest = new Nearest(px, py, this.settings.maxGapMetres(), this.settings.minGapMetres());
		if (!nearest.scan(around.drafts()) || !nearest.scan(around.mapped()) || nearest.segments == null) {
			return;
		}
		NearbySegments near = nearest.segments;
		int best = nearest.segment;
		if (touches(draft, near.owner[best], around)) {
			return;
		}
		double t = Planar.closestFraction(px, py, near.ax[best], near.ay[best], near.bx[best], near.by[best]);
		double jx = near.ax[best] + t * (near.bx[best] - near.ax[best]);
		double jy = near.ay[best] + t * (near.by[best] - near.ay[best]);
		flags.add(Flag.of(FlagKind.NEAR_MISS)
			.value("gapMetres", draft.geodesicDistance(px, py, jx, jy))
			.at(draft.frame.lon(jx), draft.frame.lat(jy))
			.other(near.owner[best].id)
			.build());
	}

	/** Whether the draft comes within the smallest gap of a road anywhere. */
	private boolean touches(LocalDraft draft, PackedFeature other, Neighbourhood around) {
		double minSq = this.settings.minGapMetres() * this.settings.minGapMetres();
		for (NearbySegments near : new NearbySegments[] { around.drafts(), around.mapped() }) {
			for (int s = 0; s < near.size; s++) {
				if (near.owner[s] != other) {
					continue;
				}
				for (int p = 0; p < draft.parts(); p++) {
					for (int i = draft.partStart(p) + 1; i < draft.partEnd(p); i++) {
						if (Planar.segmentDistanceSq(draft.x[i - 1], draft.y[i - 1], draft.x[i], draft.y[i], near.ax[s],
								near.ay[s], near.bx[s], near.by[s]) < minSq) {
							return true;
						}
					}
				}
			}
		}
		return false;
	}

	/** The nearest segment to an end within a reach, over several segment sets. */
	private static final class Nearest {

		final double px, py, reach, touchSq;

		double bestSq;

		NearbySegments segments;

		int segment = -1;

		Nearest(double px, double py, double reach, double touch) {
			this.px = px;
			this.py = py;
			this.reach = reach;
			this.touchSq = touch * touch;
			this.bestSq = reach * reach;
		}

		/** Scans a set; answers false when the end touches a road (no miss). */
		boolean scan(NearbySegments near) {
			for (int s = 0; s < near.size; s++) {
				if (Math.max(near.ax[s], near.bx[s]) < this.px - this.reach
						|| Math.min(near.ax[s], near.bx[s]) > this.px + this.reach
						|| Math.max(near.ay[s], near.by[s]) < this.py - this.reach
						|| Math.min(near.ay[s], near.by[s]) > this.py + this.reach) {
					continue;
				}
				double d = Planar.pointSegmentDistanceSq(this.px, this.py, near.ax[s], near.ay[s], near.bx[s],
						near.by[s]);
				if (d < this.touchSq) {
					return false;
				}
				if (d <= this.bestSq) {
					this.bestSq = d;
					this.segments = near;
					this.segment = s;
				}
			}
			return true;
		}

	}

}
