package org.assay.checks;

import org.assay.demo.DemoReferenceFeature;
import org.assay.demo.DemoScenario;
import org.assay.demo.PlantedFault;
import org.assay.geo.FeatureKind;
import org.locationtech.jts.geom.Geometry;

/**
 * Distances in the demo's recorded truth, measured with JTS in a frame around a draft:
 * independent of the checks' own measuring.
 */
final class TrueGaps {

	private TrueGaps() {
	}

	/**
	 * The distance in metres from a draft's true geometry to the nearest true geometry of
	 * another road draft, or of a mapped road.
	 */
	static double gap(DemoScenario scenario, String draftId) {
		Geometry own = scenario.truth().get(draftId).trueGeometry();
		MetricFrame frame = new MetricFrame(own.getCentroid().getX(), own.getCentroid().getY());
		Geometry metric = FrameGeometry.toFrame(frame, own);
		double nearest = Double.POSITIVE_INFINITY;
		for (PlantedFault other : scenario.truth().values()) {
			if (!other.draftId().equals(draftId) && other.kind() == FeatureKind.ROAD && other.trueGeometry() != null
					&& other.trueGeometry().getEnvelopeInternal().distance(own.getEnvelopeInternal()) < 0.01) {
				nearest = Math.min(nearest, metric.distance(FrameGeometry.toFrame(frame, other.trueGeometry())));
			}
		}
		for (DemoReferenceFeature mapped : scenario.reference()) {
			if (mapped.kind() == FeatureKind.ROAD
					&& mapped.geometry().getEnvelopeInternal().distance(own.getEnvelopeInternal()) < 0.01) {
				nearest = Math.min(nearest, metric.distance(FrameGeometry.toFrame(frame, mapped.geometry())));
			}
		}
		return nearest;
	}

}
