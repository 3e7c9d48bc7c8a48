package org.assay.checks;

import org.locationtech.jts.geom.Envelope;

/**
 * A run of consecutive segments of one part of a feature, the item of a
 * {@link SegmentIndex}: segments {@code from → from+1 … to−1 → to}. It is its own
 * envelope (longitude, latitude), which saves the tree an object per item.
 */
final class Chunk extends Envelope {

	private static final long serialVersionUID = 1L;

	/**
	 * The most segments in one chunk: small boxes for long lines, few items for short.
	 */
	static final int MAX_SEGMENTS = 16;

	final transient PackedFeature feature;

	final int from;

	final int to;

	Chunk(PackedFeature feature, int from, int to) {
		this.feature = feature;
		this.from = from;
		this.to = to;
		for (int i = from; i <= to; i++) {
			expandToInclude(feature.lon(i), feature.lat(i));
		}
	}

}
