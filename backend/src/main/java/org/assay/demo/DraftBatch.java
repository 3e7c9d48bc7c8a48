package org.assay.demo;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.locationtech.jts.algorithm.distance.DiscreteHausdorffDistance;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;

/**
 * Turns planned drafts into the batch: shuffles them, so that neither ids nor order say
 * anything about the truth, numbers them {@code d-00001}, ..., draws confidences, adds
 * the model's tile and raw score, converts to WGS84 and records the truth of each.
 */
final class DraftBatch {

	private static final int TILE_ZOOM = 17;

	private final List<DemoDraft> drafts = new ArrayList<>();

	private final Map<String, PlantedFault> truth = new LinkedHashMap<>();

	private DraftBatch() {
	}

	static DraftBatch assemble(List<DraftPlan> plans, LocalFrame frame, DemoRandom random) {
		List<DraftPlan> shuffled = new ArrayList<>(plans);
		random.shuffle(shuffled);
		DraftBatch batch = new DraftBatch();
		IdSequence ids = new IdSequence("d-%05d");
		for (DraftPlan plan : shuffled) {
			String id = ids.next();
			double confidence = ConfidenceModel.draw(plan.fault(), random);
			String featureClass = random.chance(0.7) ? plan.featureClass() : null;
			Geometry geometry = frame.toWgs84(plan.geometry());
			batch.drafts.add(new DemoDraft(id, plan.kind(), geometry, confidence, featureClass, tile(geometry),
					ConfidenceModel.rawScore(confidence)));
			Geometry trueGeometry = (plan.trueGeometry() != null) ? frame.toWgs84(plan.trueGeometry()) : null;
			double deviation = (plan.trueGeometry() != null)
					? DiscreteHausdorffDistance.distance(plan.geometry(), plan.trueGeometry()) : Double.NaN;
			batch.truth.put(id, new PlantedFault(id, plan.fault(), plan.kind(), plan.worldId(), plan.referenceId(),
					trueGeometry, deviation, plan.detail()));
		}
		return batch;
	}

	/**
	 * The web-map tile {@code z/x/y} of a geometry's first vertex:
	 * {@code x = ⌊(λ + 180)/360 · 2^z⌋}, {@code y = ⌊(1 - ln(tan φ + sec φ)/π)/2 · 2^z⌋}.
	 */
	static String tile(Geometry geometry) {
		Coordinate c = geometry.getCoordinate();
		double n = 1 << TILE_ZOOM;
		double phi = Math.toRadians(c.y);
		int x = (int) Math.floor((c.x + 180) / 360 * n);
		int y = (int) Math.floor((1 - StrictMath.log(StrictMath.tan(phi) + 1 / StrictMath.cos(phi)) / Math.PI) / 2 * n);
		return String.format(Locale.ROOT, "%d/%d/%d", TILE_ZOOM, x, y);
	}

	List<DemoDraft> drafts() {
		return Collections.unmodifiableList(this.drafts);
	}

	Map<String, PlantedFault> truth() {
		return Collections.unmodifiableMap(this.truth);
	}

}
