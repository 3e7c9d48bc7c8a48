package org.assay.export.training;

import java.time.Instant;

import org.assay.geo.FeatureKind;
import org.locationtech.jts.geom.Geometry;

/**
 * One example for the model's trainers: a draft whose final verdict rejected it, or
 * amended it (then with its corrected geometry).
 *
 * @param draftId the draft's id in Assay
 * @param sourceId its id in the uploaded file, or {@code null}
 * @param kind road or building
 * @param featureClass its class, or {@code null}
 * @param confidence the model's confidence
 * @param verdict {@code REJECT} or {@code AMEND}
 * @param reasonCode the final verdict's reason code
 * @param decidedAt when the final verdict was given
 * @param drafted the geometry as the model drafted it (WGS84)
 * @param corrected the corrected geometry of an amended draft, or {@code null}
 */
public record TrainingSample(long draftId, String sourceId, FeatureKind kind, String featureClass, double confidence,
		String verdict, String reasonCode, Instant decidedAt, Geometry drafted, Geometry corrected) {

}
