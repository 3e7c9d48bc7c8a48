package org.assay.demo;

import java.io.IOException;
import java.io.OutputStream;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * The demo scenario: the invented island of Brevanor in the open Atlantic (around 31.7°
 * W, 40.9° N, far from any real land), its true world, the reference layer derived from
 * it, a batch of about a thousand road and five hundred building drafts with planted
 * faults, the truth of each draft, and the demo team.
 *
 * <p>
 * Deterministic: the same seed gives the same world and byte-identical files. Validators
 * see the drafts' GeoJSON, which carries no truth; the truth is {@link #truth()}, for
 * tests and for scoring.
 */
public final class DemoScenario {

	/** The seed of the demo shipped with Assay. */
	public static final long DEFAULT_SEED = 31_700_409L;

	/** The island's centre, longitude. */
	static final double ORIGIN_LON = -31.7;

	/** The island's centre, latitude. */
	static final double ORIGIN_LAT = 40.9;

	private final long seed;

	private final DemoWorld world;

	private final List<DemoReferenceFeature> reference;

	private final DraftBatch batch;

	private DemoScenario(long seed, DemoWorld world, List<DemoReferenceFeature> reference, DraftBatch batch) {
		this.seed = seed;
		this.world = world;
		this.reference = reference;
		this.batch = batch;
	}

	/**
	 * Generates the scenario of the {@link #DEFAULT_SEED}.
	 * @return the scenario
	 */
	public static DemoScenario generate() {
		return generate(DEFAULT_SEED);
	}

	/**
	 * Generates a scenario; takes a few seconds.
	 * @param seed the seed
	 * @return the scenario, the same for the same seed
	 */
	public static DemoScenario generate(long seed) {
		LocalFrame frame = frame();
		DemoWorld metric = DemoWorldGenerator.generate(seed);
		ReferenceLayer reference = ReferenceLayer.derive(metric, DemoRandom.forStage(seed, "reference"));
		List<DraftPlan> plans = new ArrayList<>();
		plans.addAll(RoadDraftPlanter.plant(metric, reference, DemoRandom.forStage(seed, "road-drafts")));
		plans.addAll(BuildingDraftPlanter.plant(metric, reference, DemoRandom.forStage(seed, "building-drafts")));
		plans.addAll(FalseDetectionPlanter.plant(metric, DemoRandom.forStage(seed, "false-detections")));
		DraftBatch batch = DraftBatch.assemble(plans, frame, DemoRandom.forStage(seed, "batch"));
		List<DemoReferenceFeature> referenceFeatures = reference.features()
			.stream()
			.map((f) -> new DemoReferenceFeature(f.id(), f.kind(), frame.toWgs84(f.geometry()), f.featureClass(),
					f.source()))
			.toList();
		return new DemoScenario(seed, metric.map(frame::toWgs84), referenceFeatures, batch);
	}

	static LocalFrame frame() {
		return new LocalFrame(ORIGIN_LON, ORIGIN_LAT);
	}

	/**
	 * The seed this scenario was generated from.
	 * @return the seed
	 */
	public long seed() {
		return this.seed;
	}

	/**
	 * The true world.
	 * @return the world, WGS84
	 */
	public DemoWorld world() {
		return this.world;
	}

	/**
	 * The reference layer: what is already mapped.
	 * @return the reference features, roads first
	 */
	public List<DemoReferenceFeature> reference() {
		return this.reference;
	}

	/**
	 * The draft batch, in id order.
	 * @return the drafts
	 */
	public List<DemoDraft> drafts() {
		return this.batch.drafts();
	}

	/**
	 * The truth of every draft, never shown to validators.
	 * @return the planted fault of each draft, keyed by draft id, in id order
	 */
	public Map<String, PlantedFault> truth() {
		return this.batch.truth();
	}

	/**
	 * The demo team: one lead and three validators, with fixed passwords.
	 * @return the people
	 */
	public List<DemoPerson> people() {
		return DemoPerson.TEAM;
	}

	/**
	 * Writes the draft batch as a GeoJSON FeatureCollection: {@code id}, and the
	 * properties {@code kind}, {@code confidence}, {@code class} (when the model gave
	 * one), {@code model_tile} and {@code score_raw}. The stream is flushed, not closed.
	 * @param out where to write
	 * @throws IOException when writing fails
	 */
	public void writeDrafts(OutputStream out) throws IOException {
		DemoGeoJsonWriter.write(drafts(), DemoDraft::id, DemoDraft::geometry,
				(d, p) -> p.string("kind", d.kind().jsonName())
					.number("confidence", d.confidence(), 3)
					.string("class", d.featureClass())
					.string("model_tile", d.modelTile())
					.number("score_raw", d.scoreRaw(), 4),
				out);
	}

	/**
	 * Writes the reference layer as a GeoJSON FeatureCollection: {@code id}, and the
	 * properties {@code kind}, {@code class} and {@code source}. The stream is flushed,
	 * not closed.
	 * @param out where to write
	 * @throws IOException when writing fails
	 */
	public void writeReference(OutputStream out) throws IOException {
		DemoGeoJsonWriter.write(this.reference, DemoReferenceFeature::id, DemoReferenceFeature::geometry,
				(f, p) -> p.string("kind", f.kind().jsonName())
					.string("class", f.featureClass())
					.string("source", f.source()),
				out);
	}

}
