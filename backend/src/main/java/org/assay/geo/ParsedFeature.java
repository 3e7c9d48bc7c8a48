package org.assay.geo;

import org.locationtech.jts.geom.Geometry;

/**
 * One feature read from a GeoJSON FeatureCollection and found valid.
 *
 * @param index the zero-based position of the feature in the collection
 * @param id the feature's {@code id} member as text, or {@code null}
 * @param kind the kind, from the {@code kind} property
 * @param geometry the geometry in WGS84 longitude/latitude (SRID 4326)
 * @param confidence the model confidence 0..1 from the {@code confidence} property, or
 * {@code null} when absent (allowed for reference features only)
 * @param featureClass the optional {@code class} property, or {@code null}
 * @param propertiesJson the feature's {@code properties} object verbatim as JSON text
 * ({@code "{}"} when absent or null)
 */
public record ParsedFeature(int index, String id, FeatureKind kind, Geometry geometry, Double confidence,
		String featureClass, String propertiesJson) {
}
