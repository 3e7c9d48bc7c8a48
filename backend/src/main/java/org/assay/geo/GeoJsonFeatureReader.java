package org.assay.geo;

import java.io.Closeable;
import java.io.IOException;
import java.io.InputStream;

/**
 * Reads the features of a GeoJSON FeatureCollection (RFC 7946) one at a time from a
 * stream, validating each, without holding the document in memory.
 *
 * <p>
 * STUB: to be implemented (streaming Jackson parser, JTS geometries).
 */
public final class GeoJsonFeatureReader implements Closeable {

	private GeoJsonFeatureReader() {
	}

	/**
	 * Opens a reader over a stream.
	 * @param in the GeoJSON bytes (UTF-8)
	 * @param options limits and requirements
	 * @return the reader
	 */
	public static GeoJsonFeatureReader open(InputStream in, ReaderOptions options) {
		throw new UnsupportedOperationException("not yet");
	}

	/**
	 * Reads the next feature.
	 * @return the next valid feature, or {@code null} after the last one
	 * @throws FeatureProblem when the input or the feature is not acceptable
	 */
	public ParsedFeature next() {
		throw new UnsupportedOperationException("not yet");
	}

	@Override
	public void close() throws IOException {
	}

}
