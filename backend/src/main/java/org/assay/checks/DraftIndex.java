package org.assay.checks;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;

import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.index.strtree.STRtree;

/**
 * The drafts of a batch held for checking: every draft packed (see
 * {@link PackedFeature}), the segments of road drafts in a {@link SegmentIndex} and the
 * boxes of building drafts in a JTS STRtree. Built once, read by all threads.
 */
final class DraftIndex {

	final List<PackedFeature> drafts = new ArrayList<>();

	final SegmentIndex roads = new SegmentIndex();

	private STRtree buildings = new STRtree();

	private TreeWalk buildingWalk;

	/** Packs and adds a draft; its number is its position in the batch. */
	void add(CheckedDraft draft) {
		PackedFeature packed = PackedFeature.of(this.drafts.size(), draft.id(), draft.kind(), draft.confidence(),
				draft.geometry());
		this.drafts.add(packed);
		if (packed.isRoad()) {
			this.roads.add(packed);
		}
		else {
			this.buildings.insert(new Envelope(packed.minLon, packed.maxLon, packed.minLat, packed.maxLat), packed);
		}
	}

	void build() {
		this.roads.build();
		this.buildingWalk = TreeWalk.of(this.buildings);
		this.buildings = null;
	}

	/**
	 * Calls back for every building draft whose box meets a box {minLon, minLat, maxLon,
	 * maxLat}.
	 */
	void buildingsNear(double[] box, Consumer<PackedFeature> visitor) {
		this.buildingWalk.query(box[0], box[1], box[2], box[3], visitor);
	}

}
