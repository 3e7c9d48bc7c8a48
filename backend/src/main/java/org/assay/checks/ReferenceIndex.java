package org.assay.checks;

import java.util.Collection;

import org.assay.geo.FeatureKind;

/**
 * The reference layer held for checking: the segments of mapped roads and of the rings of
 * mapped buildings, each in its own {@link SegmentIndex} (a JTS STRtree). Built once,
 * read by all threads.
 */
final class ReferenceIndex {

	final SegmentIndex roads = new SegmentIndex();

	final SegmentIndex buildings = new SegmentIndex();

	ReferenceIndex(Collection<MappedFeature> features) {
		int number = 0;
		for (MappedFeature feature : features) {
			PackedFeature packed = PackedFeature.of(number++, feature.id(), feature.kind(), 1, feature.geometry());
			((feature.kind() == FeatureKind.ROAD) ? this.roads : this.buildings).add(packed);
		}
		this.roads.build();
		this.buildings.build();
	}

}
