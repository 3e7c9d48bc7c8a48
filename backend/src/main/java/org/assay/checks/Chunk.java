package org.assay.checks;

/**
 * A run of consecutive segments of one part of a feature, the item of a
 * {@link SegmentIndex}: segments {@code from → from+1 … to−1 → to}. Its box lives in the
 * index's flat arrays ({@link TreeWalk}), not here.
 */
final class Chunk {

	/**
	 * The most segments in one chunk: small boxes for long lines, one item for a drafted
	 * road of 15 to 30 segments (each item costs the index about 70 bytes).
	 */
	static final int MAX_SEGMENTS = 32;

	final PackedFeature feature;

	final int from;

	final int to;

	Chunk(PackedFeature feature, int from, int to) {
		this.feature = feature;
		this.from = from;
		this.to = to;
	}

}
