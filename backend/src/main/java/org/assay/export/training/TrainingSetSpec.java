package org.assay.export.training;

/**
 * How a training set is cut.
 *
 * @param zoom the WebMercatorQuad zoom of the mask tiles, {@value #MIN_ZOOM} to
 * {@value #MAX_ZOOM}
 * @param roadWidthMetres the width roads are buffered to on the ground, in metres
 * @param about the text of the set's README: what batch, which options, the caution
 */
public record TrainingSetSpec(int zoom, double roadWidthMetres, String about) {

	/** The zoom when none is given: about 0.6 m per pixel at the equator. */
	public static final int DEFAULT_ZOOM = 18;

	/**
	 * The road width when none is given: two lanes of about 3 m each (common practice,
	 * from memory).
	 */
	public static final double DEFAULT_ROAD_WIDTH = 6.0;

	public static final int MIN_ZOOM = 12;

	public static final int MAX_ZOOM = 22;

	public static final double MAX_ROAD_WIDTH = 100.0;

	public TrainingSetSpec {
		if (zoom < MIN_ZOOM || zoom > MAX_ZOOM) {
			throw new IllegalArgumentException("zoom must be from " + MIN_ZOOM + " to " + MAX_ZOOM + ", not " + zoom);
		}
		if (!(roadWidthMetres > 0 && roadWidthMetres <= MAX_ROAD_WIDTH)) {
			throw new IllegalArgumentException(
					"roadWidth must be more than 0 m and at most " + MAX_ROAD_WIDTH + " m, not " + roadWidthMetres);
		}
	}

}
