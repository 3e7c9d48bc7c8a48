package org.assay.demo;

import org.assay.geo.FeatureKind;
import org.locationtech.jts.geom.Geometry;

/**
 * A draft as planned, before it gets its id and confidence: metric geometries, and the
 * truth to record.
 */
record DraftPlan(FeatureKind kind, Geometry geometry, FaultClass fault, String featureClass, String worldId,
		String referenceId, Geometry trueGeometry, String detail) {
}
