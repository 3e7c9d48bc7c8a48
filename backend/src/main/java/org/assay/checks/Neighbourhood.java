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

	private static final ThreadLocal<NearbySegments[]> SETS = ThreadLocal
		.withInitial(() -> new NearbySegments[] { new NearbySegments(), new NearbySegments() });

	/**
	 * Gathers the neighbourhood of a draft into the calling thread's two sets, which the
	 * next call on the same thread empties: use it before gathering for the next draft.
	 */
	static Neighbourhood gather(ReferenceIndex reference, DraftIndex drafts, LocalDraft draft, double reach) {
		double[] box = draft.searchBox(reach);
		NearbySegments[] sets = SETS.get();
		if (!draft.feature.isRoad()) {
			sets[1].size = 0;
			return new Neighbourhood(sets[0].refill(reference.buildings, draft, box), sets[1]);
		}
		return new Neighbourhood(sets[0].refill(reference.roads, draft, box), sets[1].refill(drafts.roads, draft, box));
	}

}
