package org.assay.demo;

import org.assay.geo.FeatureKind;
import org.locationtech.jts.geom.Geometry;

/**
 * One feature of the demo's reference layer: what is already mapped.
 *
 * @param id the source id, for example {@code ref-r-0001} or {@code ref-b-0001}
 * @param kind road or building
 * @param geometry WGS84 longitude/latitude, 7 decimals
 * @param featureClass for example {@code main}, {@code residential} or {@code house}
 * @param source where the mapped feature came from, for example {@code field survey}
 */
public record DemoReferenceFeature(String id, FeatureKind kind, Geometry geometry, String featureClass, String source) {
}
