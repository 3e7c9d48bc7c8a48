package org.assay.batches;

import org.assay.geo.FeatureKind;
import org.locationtech.jts.geom.Geometry;

/**
 * One drafted feature as stored.
 *
 * @param id the draft id
 * @param batchId its batch
 * @param cellId its cell
 * @param seq its position in the uploaded file
 * @param sourceId the id it had in the uploaded file, or {@code null}
 * @param kind road or building
 * @param confidence the model's confidence 0..1
 * @param featureClass the optional class
 * @param geometry the drafted geometry
 * @param propertiesJson the uploaded properties, verbatim
 * @param risk the risk score the checks gave it, 0 to 1
 * @param flagsJson what the checks found, as a JSON array of flags, or {@code null}
 */
public record Draft(long id, long batchId, long cellId, int seq, String sourceId, FeatureKind kind, double confidence,
		String featureClass, Geometry geometry, String propertiesJson, double risk, String flagsJson) {
}
