package org.assay.checks;

/**
 * What lies around one draft, gathered once for all checks: two index queries per draft
 * instead of one or more per check, which was most of the time (an STRtree query costs
 * more than the measuring that follows it). For a road draft, the segments of mapped
 * roads and of other road drafts; for a building, the segments of mapped buildings (the
 * building check looks up its own neighbours). All within the draft's box grown by the
 * largest reach of the checks that are on, drawn in the draft's frame.
 *
 * @param mapped segments of mapped features of the draft's kind
 * @param drafts segments of other road drafts (none for a building)
 */
record Neighbourhood(NearbySegments mapped, NearbySegments drafts) {

	static Neighbourhood gather(ReferenceIndex reference, DraftIndex drafts, LocalDraft draft, double reach) {
		double[] box = draft.searchBox(reach);
		if (!draft.feature.isRoad()) {
			return new Neighbourhood(NearbySegments.gather(reference.buildings, draft, box), new NearbySegments());
		}
		return new Neighbourhood(NearbySegments.gather(reference.roads, draft, box),
				NearbySegments.gather(drafts.roads, draft, box));
	}

}
