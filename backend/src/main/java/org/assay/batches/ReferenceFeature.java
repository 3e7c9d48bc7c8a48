package org.assay.batches;

import org.assay.geo.FeatureKind;
import org.locationtech.jts.geom.Geometry;

/**
 * One feature of a batch's reference layer: what is already on the map.
 *
 * @param id the stored id
 * @param sourceId the id it had in the uploaded file, or {@code null}
 * @param kind road or building
 * @param geometry its geometry
 */
public record ReferenceFeature(long id, String sourceId, FeatureKind kind, Geometry geometry) {
}
