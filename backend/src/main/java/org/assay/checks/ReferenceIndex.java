package org.assay.checks;

import java.util.Iterator;

import org.assay.geo.FeatureKind;

/**
 * The reference layer held for checking: the segments of mapped roads and of the rings of
 * mapped buildings, each in its own {@link SegmentIndex} (a JTS STRtree), packed like the
 * drafts (see {@link PackedFeature}). Built once, read by all threads.
 */
final class ReferenceIndex {

	final SegmentIndex roads = new SegmentIndex();

	final SegmentIndex buildings = new SegmentIndex();

	private int size;

	/** Packs and indexes the features as they are read, keeping no JTS geometry. */
	ReferenceIndex(Iterator<MappedFeature> features) {
		int number = 0;
		while (features.hasNext()) {
			MappedFeature feature = features.next();
			PackedFeature packed = PackedFeature.of(number++, feature.id(), feature.kind(), 1, feature.geometry());
			((feature.kind() == FeatureKind.ROAD) ? this.roads : this.buildings).add(packed);
		}
		this.size = number;
		this.roads.build();
		this.buildings.build();
	}

	int size() {
		return this.size;
	}

}
