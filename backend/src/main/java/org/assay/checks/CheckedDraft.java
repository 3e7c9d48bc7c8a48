package org.assay.checks;

import org.assay.geo.FeatureKind;
import org.locationtech.jts.geom.Geometry;

/**
 * A draft to check.
 *
 * @param id the draft's id, unique in its batch
 * @param kind road (LineString or MultiLineString) or building (Polygon or MultiPolygon)
 * @param geometry WGS84 longitude/latitude, valid and not empty
 * @param confidence the model's confidence, 0 to 1
 */
public record CheckedDraft(String id, FeatureKind kind, Geometry geometry, double confidence) {
}
