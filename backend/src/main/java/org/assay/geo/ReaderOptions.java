package org.assay.geo;

/**
 * Limits and requirements for reading a GeoJSON FeatureCollection.
 *
 * @param requireConfidence whether every feature must carry a {@code confidence} property
 * (drafts) or may omit it (reference features)
 * @param maxCoordinatesPerFeature the most positions one feature may have
 * @param maxPropertiesBytes the largest {@code properties} object of one feature, in
 * bytes of JSON text
 */
public record ReaderOptions(boolean requireConfidence, int maxCoordinatesPerFeature, int maxPropertiesBytes) {

	/** Default limit of positions per feature. */
	public static final int DEFAULT_MAX_COORDINATES = 100_000;

	/** Default limit of a feature's properties, 1 MB. */
	public static final int DEFAULT_MAX_PROPERTIES_BYTES = 1_000_000;

	/**
	 * Options for drafts: confidence required, default limits.
	 * @return the options
	 */
	public static ReaderOptions drafts() {
		return new ReaderOptions(true, DEFAULT_MAX_COORDINATES, DEFAULT_MAX_PROPERTIES_BYTES);
	}

	/**
	 * Options for a reference layer: confidence optional, default limits.
	 * @return the options
	 */
	public static ReaderOptions reference() {
		return new ReaderOptions(false, DEFAULT_MAX_COORDINATES, DEFAULT_MAX_PROPERTIES_BYTES);
	}

}
