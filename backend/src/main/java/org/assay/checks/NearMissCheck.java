package org.assay.checks;

import java.util.List;

/**
 * Near miss: a road draft's end lies between {@code minGapMetres} and
 * {@code maxGapMetres} from another road (another draft, or a mapped road) and the draft
 * touches that road nowhere: the model stopped short of a junction.
 *
 * <p>
 * For each end of each part of the draft (a closed part has no end), the road segments
 * within {@code maxGapMetres} of the end are found through the indexes with a box around
 * the end, not around the draft, and measured in the draft's frame. The nearest decides:
 * an end closer than {@code minGapMetres} to any road touches it and is no miss (the scan
 * stops there); an end farther than {@code maxGapMetres} from all is free. For a miss,
 * the draft's segments near the other road are measured against it, stopping at the first
 * pair that touches. Parts of the same draft are not "another road".
 *
 * <p>
 * One {@link FlagKind#NEAR_MISS} per end: {@code gapMetres} (geodesic, GeographicLib),
 * the point to join (the nearest point of the other road) and the other road's id.
 */
final class NearMissCheck implements DraftCheck {

	private final NearMissSettings settings;

	private final ReferenceIndex reference;

	private final DraftIndex drafts;

	NearMissCheck(NearMissSettings settings, ReferenceIndex reference, DraftIndex drafts) {
		this.settings = settings;
		this.reference = reference;
		this.drafts = drafts;
	}

	@Override
	public String name() {
		return "near-miss";
	}

	@Override
	public void check(LocalDraft draft, List<Flag> flags) {
		if (!draft.feature.isRoad()) {
			return;
		}
		for (int p = 0; p < draft.parts(); p++) {
			int first = draft.partStart(p);
			int last = draft.partEnd(p) - 1;
			if (last == first || (draft.x[first] == draft.x[last] && draft.y[first] == draft.y[last])) {
				continue;
			}
			end(draft, first, flags);
			end(draft, last, flags);
		}
	}

	private void end(LocalDraft draft, int vertex, List<Flag> flags) {
		double lon = draft.feature.lon(vertex), lat = draft.feature.lat(vertex);
		double dLon = draft.frame.degreesLon(this.settings.maxGapMetres());
		double dLat = MetricFrame.degreesLat(this.settings.maxGapMetres());
		double[] box = { lon - dLon, lat - dLat, lon + dLon, lat + dLat };
		NearbySegments near = NearbySegments.gather(this.drafts.roads, draft, box);
		near.addFrom(this.reference.roads, draft, box);
		double px = draft.x[vertex], py = draft.y[vertex];
		double minSq = this.settings.minGapMetres() * this.settings.minGapMetres();
		double bestSq = Double.POSITIVE_INFINITY;
		int best = -1;
		for (int s = 0; s < near.size; s++) {
			double d = Planar.pointSegmentDistanceSq(px, py, near.ax[s], near.ay[s], near.bx[s], near.by[s]);
			if (d < minSq) {
				return;
			}
			if (d < bestSq) {
				bestSq = d;
				best = s;
			}
		}
		double max = this.settings.maxGapMetres();
		if (best < 0 || bestSq > max * max || touches(draft, near.owner[best])) {
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
	private boolean touches(LocalDraft draft, PackedFeature other) {
		double[] box = draft.searchBox(this.settings.minGapMetres());
		NearbySegments near = NearbySegments.gather(isDraft(other) ? this.drafts.roads : this.reference.roads, draft,
				box);
		double minSq = this.settings.minGapMetres() * this.settings.minGapMetres();
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
		return false;
	}

	private boolean isDraft(PackedFeature feature) {
		int n = feature.number;
		return n < this.drafts.drafts.size() && this.drafts.drafts.get(n) == feature;
	}

}
