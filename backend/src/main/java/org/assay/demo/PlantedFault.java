package org.assay.demo;

import org.assay.geo.FeatureKind;
import org.locationtech.jts.geom.Geometry;

/**
 * The recorded truth of one demo draft: what it really is, which true feature (and which
 * reference feature) it comes from, and the true geometry of the stretch or building it
 * drafts. Never part of the GeoJSON the validators see.
 *
 * @param draftId the draft's id, for example {@code d-00042}
 * @param faultClass what the draft really is
 * @param kind road or building
 * @param worldId the true feature in {@link DemoWorld}, or {@code null} for a false
 * detection
 * @param referenceId the reference feature it duplicates or extends, or {@code null}
 * @param trueGeometry what the draft should have been (WGS84), or {@code null} for a
 * false detection
 * @param deviationMetres the discrete Hausdorff distance between draft and true geometry
 * in metres, {@code NaN} for a false detection
 * @param detail a short description of the fault for people, for example
 * {@code offset sideways by 9.3 m}
 */
public record PlantedFault(String draftId, FaultClass faultClass, FeatureKind kind, String worldId, String referenceId,
		Geometry trueGeometry, double deviationMetres, String detail) {
}
