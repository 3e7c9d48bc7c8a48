package org.assay.demo;

import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;

import org.assay.accounts.Role;
import org.assay.demo.DemoWorld.RoadClass;
import org.assay.geo.FeatureKind;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.LineString;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The demo scenario checked against its recorded truth. Metres are measured in the
 * scenario's local frame ({@link LocalFrame}), whose error on the island is under 0.07%
 * of the distance ({@code DemoWorldTests} compares it with exact geodesics).
 */
class DemoScenarioTests {

	private final DemoFixture demo = DemoFixture.get();

	private final DemoScenario scenario = this.demo.scenario;

	@Test
	void theSameSeedWritesByteIdenticalFiles() {
		DemoScenario again = DemoScenario.generate(DemoScenario.DEFAULT_SEED);
		assertThat(DemoFixture.bytes(again::writeDrafts)).isEqualTo(this.demo.draftBytes);
		assertThat(DemoFixture.bytes(again::writeReference)).isEqualTo(this.demo.referenceBytes);
		assertThat(again.truth()).isEqualTo(this.scenario.truth());
	}

	@Test
	void draftCountsLieInTheStatedRanges() {
		assertThat(this.demo.drafts).hasSize(this.scenario.drafts().size());
		assertThat(count(FeatureKind.ROAD)).isBetween(800L, 1200L);
		assertThat(count(FeatureKind.BUILDING)).isBetween(400L, 700L);
		assertThat(this.scenario.truth().keySet())
			.containsExactlyElementsOf(this.scenario.drafts().stream().map(DemoDraft::id).toList());
	}

	@Test
	void theReferenceHoldsSixtyPerCentOfMainRoadsAndStreetsAndHalfTheBuildings() {
		long mappable = this.scenario.world().roads().stream().filter((r) -> r.roadClass() != RoadClass.TRACK).count();
		long roads = this.scenario.reference().stream().filter((f) -> f.kind() == FeatureKind.ROAD).count();
		long buildings = this.scenario.reference().size() - roads;
		assertThat(roads).isEqualTo(Math.round(0.6 * mappable));
		assertThat(buildings).isEqualTo(Math.round(0.5 * this.scenario.world().buildings().size()));
	}

	@Test
	void everyFaultClassIsPlantedAndMixedThroughTheIdOrder() {
		assertThat(faultsOf(FeatureKind.ROAD)).containsExactlyInAnyOrder(FaultClass.values());
		assertThat(faultsOf(FeatureKind.BUILDING)).contains(FaultClass.GOOD, FaultClass.ALREADY_MAPPED,
				FaultClass.SHIFTED, FaultClass.FALSE_DETECTION);
		Set<FaultClass> firstHundred = EnumSet.noneOf(FaultClass.class);
		this.scenario.truth().values().stream().limit(100).forEach((t) -> firstHundred.add(t.faultClass()));
		assertThat(firstHundred).hasSizeGreaterThanOrEqualTo(5);
	}

	@Test
	void confidenceIsHigherForGoodDraftsThanForFalseDetectionsWithOverlap() {
		List<Double> good = confidences(FaultClass.GOOD);
		List<Double> wrong = confidences(FaultClass.FALSE_DETECTION);
		assertThat(mean(good)).isGreaterThan(mean(wrong) + 0.3);
		assertThat(share(good, 0.7, 0.99)).isGreaterThan(0.8);
		assertThat(share(wrong, 0.2, 0.6)).isGreaterThan(0.8);
		assertThat(wrong).anyMatch((c) -> c >= 0.8);
		assertThat(good).anyMatch((c) -> c <= 0.5);
		assertThat(this.scenario.drafts()).allMatch((d) -> d.confidence() >= 0 && d.confidence() <= 1);
	}

	@Test
	void alreadyMappedDraftsLieWithinThreeMetresOfTheirReferenceFeature() {
		LocalFrame frame = DemoScenario.frame();
		List<PlantedFault> duplicates = truthOf(FaultClass.ALREADY_MAPPED);
		assertThat(duplicates).isNotEmpty();
		for (PlantedFault fault : duplicates) {
			Geometry reference = frame.toMetres(this.demo.referenceGeometries.get(fault.referenceId()));
			Geometry draft = frame.toMetres(this.demo.writtenGeometry(fault.draftId()));
			for (Coordinate vertex : draft.getCoordinates()) {
				assertThat(reference.distance(LocalFrame.METRES.createPoint(vertex))).as(fault.draftId())
					.isLessThan(3.0);
			}
		}
	}

	@Test
	void goodDraftsFollowTheTruthAndShiftedOnesDoNot() {
		for (FaultClass close : List.of(FaultClass.GOOD, FaultClass.ALREADY_MAPPED, FaultClass.PARTIAL,
				FaultClass.FRAGMENT)) {
			assertThat(truthOf(close)).allMatch((t) -> t.deviationMetres() < 4.0 && t.trueGeometry() != null);
		}
		assertThat(truthOf(FaultClass.SHIFTED)).allMatch((t) -> t.deviationMetres() > 2.5);
		assertThat(
				truthOf(FaultClass.SHIFTED).stream().mapToDouble(PlantedFault::deviationMetres).average().orElseThrow())
			.isGreaterThan(6.0);
		assertThat(truthOf(FaultClass.FALSE_DETECTION))
			.allMatch((t) -> t.worldId() == null && t.trueGeometry() == null && Double.isNaN(t.deviationMetres()));
	}

	@Test
	void fragmentsAreShortAndPartialDraftsContinueTheirReferenceFeature() {
		LocalFrame frame = DemoScenario.frame();
		assertThat(truthOf(FaultClass.FRAGMENT))
			.allMatch((t) -> frame.toMetres(this.demo.writtenGeometry(t.draftId())).getLength() < 80);
		for (PlantedFault fault : truthOf(FaultClass.PARTIAL)) {
			Geometry reference = frame.toMetres(this.demo.referenceGeometries.get(fault.referenceId()));
			LineString draft = (LineString) frame.toMetres(this.demo.writtenGeometry(fault.draftId()));
			assertThat(reference.distance(draft.getStartPoint())).as(fault.draftId()).isLessThan(3.0);
			assertThat(reference.distance(draft.getEndPoint())).as(fault.draftId()).isGreaterThan(30.0);
		}
	}

	@Test
	void theTeamIsOneLeadAndThreeValidatorsWithDistinctNonTrivialPasswords() {
		List<DemoPerson> people = this.scenario.people();
		assertThat(people).extracting(DemoPerson::role)
			.containsExactlyInAnyOrder(Role.LEAD, Role.VALIDATOR, Role.VALIDATOR, Role.VALIDATOR);
		assertThat(people).extracting(DemoPerson::username)
			.doesNotHaveDuplicates()
			.allMatch((u) -> u.matches("[a-z]+"));
		assertThat(people).extracting(DemoPerson::password)
			.doesNotHaveDuplicates()
			.allMatch((p) -> p.length() >= 12 && !p.toLowerCase().contains("password"));
	}

	private long count(FeatureKind kind) {
		return this.demo.drafts.stream()
			.filter((f) -> f.get("properties").get("kind").stringValue().equals(kind.jsonName()))
			.count();
	}

	private Set<FaultClass> faultsOf(FeatureKind kind) {
		return this.scenario.truth()
			.values()
			.stream()
			.filter((t) -> t.kind() == kind)
			.map(PlantedFault::faultClass)
			.collect(Collectors.toCollection(() -> EnumSet.noneOf(FaultClass.class)));
	}

	private List<PlantedFault> truthOf(FaultClass fault) {
		return this.scenario.truth().values().stream().filter((t) -> t.faultClass() == fault).toList();
	}

	private List<Double> confidences(FaultClass fault) {
		return this.demo.drafts.stream()
			.filter((f) -> this.scenario.truth().get(f.get("id").stringValue()).faultClass() == fault)
			.map((f) -> f.get("properties").get("confidence").doubleValue())
			.toList();
	}

	private static double mean(List<Double> values) {
		return values.stream().mapToDouble(Double::doubleValue).average().orElseThrow();
	}

	private static double share(List<Double> values, double lo, double hi) {
		return values.stream().filter((v) -> v >= lo && v <= hi).count() / (double) values.size();
	}

}
