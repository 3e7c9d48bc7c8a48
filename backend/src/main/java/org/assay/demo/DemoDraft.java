package org.assay.demo;

import org.assay.geo.FeatureKind;
import org.locationtech.jts.geom.Geometry;

/**
 * One draft of the demo batch, as a validator sees it.
 *
 * @param id the feature id, for example {@code d-00042}
 * @param kind road or building
 * @param geometry WGS84 longitude/latitude, 7 decimals
 * @param confidence the model's confidence, 0 to 1
 * @param featureClass the class the model gave, for example {@code track} or
 * {@code house}, or {@code null}
 * @param modelTile the web-map tile the model drafted it on, {@code z/x/y}
 * @param scoreRaw the model's raw score, the logit of the confidence
 */
public record DemoDraft(String id, FeatureKind kind, Geometry geometry, double confidence, String featureClass,
		String modelTile, double scoreRaw) {
}
