package org.assay.checks;

import org.assay.geo.FeatureKind;
import org.locationtech.jts.geom.Geometry;

/**
 * A feature of the reference layer: what is already on the map.
 *
 * @param id the feature's id
 * @param kind road or building
 * @param geometry WGS84 longitude/latitude, not empty
 */
public record MappedFeature(String id, FeatureKind kind, Geometry geometry) {
}
