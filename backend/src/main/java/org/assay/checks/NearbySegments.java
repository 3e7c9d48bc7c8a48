package org.assay.checks;

import java.util.Arrays;

/**
 * The segments of other features near a draft, drawn in the draft's frame: what a check
 * measures the draft against. Gathered from a {@link SegmentIndex} with a box, keeping
 * only segments whose own box meets it.
 */
final class NearbySegments {

	int size;

	double[] ax = new double[128];

	double[] ay = new double[128];

	double[] bx = new double[128];

	double[] by = new double[128];

	PackedFeature[] owner = new PackedFeature[128];

	/** The owner's vertex at the start of each segment. */
	int[] vertex = new int[128];

	/**
	 * Gathers segments of an index within a box, leaving out the draft itself.
	 * @param box {minLon, minLat, maxLon, maxLat}
	 */
	static NearbySegments gather(SegmentIndex index, LocalDraft draft, double[] box) {
		NearbySegments segments = new NearbySegments();
		segments.addFrom(index, draft, box);
		return segments;
	}

	/**
	 * Gathers into this set, emptied first: a thread reuses its sets from draft to draft
	 * rather than allocating and zeroing some kilobytes for each.
	 */
	NearbySegments refill(SegmentIndex index, LocalDraft draft, double[] box) {
		this.size = 0;
		addFrom(index, draft, box);
		return this;
	}

	void addFrom(SegmentIndex index, LocalDraft draft, double[] box) {
		MetricFrame frame = draft.frame;
		index.query(box[0], box[1], box[2], box[3], (chunk) -> {
			PackedFeature f = chunk.feature;
			if (f == draft.feature) {
				return;
			}
			// a segment is kept when its own box meets the query box; each kept vertex is
			// drawn once, and only kept ones are drawn
			double lon0 = f.lon(chunk.from), lat0 = f.lat(chunk.from);
			double x0 = 0, y0 = 0;
			boolean drawn = false;
			for (int i = chunk.from; i < chunk.to; i++) {
				double lon1 = f.lon(i + 1), lat1 = f.lat(i + 1);
				boolean keep = Math.max(lon0, lon1) >= box[0] && Math.min(lon0, lon1) <= box[2]
						&& Math.max(lat0, lat1) >= box[1] && Math.min(lat0, lat1) <= box[3];
				if (keep) {
					if (!drawn) {
						x0 = frame.x(lon0);
						y0 = frame.y(lat0);
					}
					double x1 = frame.x(lon1), y1 = frame.y(lat1);
					add(x0, y0, x1, y1, f, i);
					x0 = x1;
					y0 = y1;
				}
				drawn = keep;
				lon0 = lon1;
				lat0 = lat1;
			}
		});
	}

	private void add(double x0, double y0, double x1, double y1, PackedFeature f, int i) {
		if (this.size == this.ax.length) {
			int n = 2 * this.size;
			this.ax = Arrays.copyOf(this.ax, n);
			this.ay = Arrays.copyOf(this.ay, n);
			this.bx = Arrays.copyOf(this.bx, n);
			this.by = Arrays.copyOf(this.by, n);
			this.owner = Arrays.copyOf(this.owner, n);
			this.vertex = Arrays.copyOf(this.vertex, n);
		}
		this.ax[this.size] = x0;
		this.ay[this.size] = y0;
		this.bx[this.size] = x1;
		this.by[this.size] = y1;
		this.owner[this.size] = f;
		this.vertex[this.size] = i;
		this.size++;
	}

	/**
	 * The squared distance from a point to the nearest segment, at most {@code limitSq}.
	 */
	double distanceSq(double px, double py) {
		double best = Double.POSITIVE_INFINITY;
		for (int s = 0; s < this.size; s++) {
			best = Math.min(best,
					Planar.pointSegmentDistanceSq(px, py, this.ax[s], this.ay[s], this.bx[s], this.by[s]));
		}
		return best;
	}

	/** The nearest segment to a point, or −1 when there is none. */
	int nearest(double px, double py) {
		double best = Double.POSITIVE_INFINITY;
		int nearest = -1;
		for (int s = 0; s < this.size; s++) {
			double d = Planar.pointSegmentDistanceSq(px, py, this.ax[s], this.ay[s], this.bx[s], this.by[s]);
			if (d < best) {
				best = d;
				nearest = s;
			}
		}
		return nearest;
	}

}
