package org.assay.checks;

import java.util.function.Consumer;

import org.locationtech.jts.geom.Envelope;

import org.locationtech.jts.index.strtree.STRtree;

/**
 * The segments of many features in a JTS {@link STRtree}, in chunks of up to
 * {@value Chunk#MAX_SEGMENTS} segments, so that a long road is found only where a query
 * box meets it. Built once, then queried from many threads.
 */
final class SegmentIndex {

	private STRtree tree = new STRtree();

	private TreeWalk walk;

	private int size;

	/** Adds the segments of every part of a feature. */
	void add(PackedFeature feature) {
		for (int p = 0; p < feature.partEnds.length; p++) {
			int start = feature.partStart(p);
			int last = feature.partEnds[p] - 1;
			// chunks of equal size: 40 segments make two of 20, not one of 32 and one of
			// 8
			int chunks = (last - start + Chunk.MAX_SEGMENTS - 1) / Chunk.MAX_SEGMENTS;
			int size = (last - start + chunks - 1) / chunks;
			for (int from = start; from < last; from += size) {
				Chunk chunk = new Chunk(feature, from, Math.min(last, from + size));
				Envelope box = new Envelope();
				for (int i = chunk.from; i <= chunk.to; i++) {
					box.expandToInclude(feature.lon(i), feature.lat(i));
				}
				this.tree.insert(box, chunk);
				this.size++;
			}
		}
	}

	/** Finishes the tree; call once, before querying. */
	void build() {
		this.walk = TreeWalk.of(this.tree);
		// the flat copy answers all queries; the tree's objects can go
		this.tree = null;
	}

	int size() {
		return this.size;
	}

	/** Calls back for every chunk whose box meets the given box. */
	void query(double minLon, double minLat, double maxLon, double maxLat, Consumer<Chunk> visitor) {
		this.walk.query(minLon, minLat, maxLon, maxLat, visitor);
	}

}
