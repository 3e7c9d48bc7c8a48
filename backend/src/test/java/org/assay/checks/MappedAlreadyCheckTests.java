package org.assay.checks;

import java.util.Map;

import org.junit.jupiter.api.Test;

import static org.assay.checks.Fixtures.checkKinds;
import static org.assay.checks.Fixtures.checkPoint;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * Tests for {@link MappedAlreadyCheck}. Geometries in metres (see {@link Fixtures}).
 */
class MappedAlreadyCheckTests {

	private static final CheckSettings ONLY = CheckSettings.NONE.with(MappedSettings.DEFAULTS);

	@Test
	void flagsADraftThatRunsAlongAMappedRoadAsADuplicate() {
		// every vertex 3 m beside the mapped road: share 160/160 = 1, Hausdorff 3 m
		Flag flag = only(new Fixtures().mappedRoad("r1", "LINESTRING (0 0, 200 0)")
			.road("d1", "LINESTRING (20 3, 100 3, 180 3)")
			.check(ONLY), "d1", FlagKind.MAPPED_ALREADY);
		assertThat(flag.value("share")).isCloseTo(1, within(1e-9));
		assertThat(flag.value("hausdorffMetres")).isCloseTo(3, within(1e-3));
		assertThat(flag.otherId()).isEqualTo("r1");
		assertThat(flag.point()).isNull();
	}

	@Test
	void flagsADraftThatContinuesAMappedRoadAsAnExtension() {
		// the draft runs 2 m beside r1 from x = 60; r1 ends at x = 100, and its 8 m
		// buffer
		// reaches along y = 2 to x = 100 + sqrt(8² - 2²) = 107.746; so 47.746 of 140 m
		// along: share 0.34104; the far vertex (200, 2) is sqrt(100² + 2²) = 100.020 m
		// off
		Flag flag = only(new Fixtures().mappedRoad("r1", "LINESTRING (0 0, 100 0)")
			.road("d1", "LINESTRING (60 2, 100 2, 200 2)")
			.check(ONLY), "d1", FlagKind.EXTENDS_MAPPED);
		double along = 40 + Math.sqrt(60);
		assertThat(flag.value("share")).isCloseTo(along / 140, within(1e-6));
		assertThat(flag.value("alongMetres")).isCloseTo(along, within(1e-3));
		assertThat(flag.value("hausdorffMetres")).isCloseTo(Math.sqrt(100 * 100 + 4), within(1e-3));
		checkPoint(flag, 100 + Math.sqrt(60), 2);
	}

	@Test
	void takesADraftWithAVertexBeyondTheHausdorffLimitForAnExtensionEvenWhenAlmostAllRunsAlong() {
		// 200 m along at 1 m, then up to (200, 13), 13 m from r1's end (200, 0): over the
		// 12 m limit. Along: 200 + (8 - 1) = 207 of 212 m, share 0.976 > 0.9
		Flag flag = only(new Fixtures().mappedRoad("r1", "LINESTRING (0 0, 200 0)")
			.road("d1", "LINESTRING (0 1, 200 1, 200 13)")
			.check(ONLY), "d1", FlagKind.EXTENDS_MAPPED);
		assertThat(flag.value("share")).isCloseTo(207.0 / 212, within(1e-6));
		assertThat(flag.value("hausdorffMetres")).isCloseTo(13, within(1e-3));
		checkPoint(flag, 200, 8);
	}

	@Test
	void doesNotFlagARoadThatCrossesAMappedRoad() {
		// a right-angle crossing runs 2 x 8 = 16 m within the buffer, under 20 m
		Map<String, DraftFlags> flags = new Fixtures().mappedRoad("r1", "LINESTRING (0 0, 100 0)")
			.road("d1", "LINESTRING (50 -50, 50 50)")
			.check(ONLY);
		checkKinds(flags.get("d1"));
	}

	@Test
	void doesNotFlagARoadFarFromEveryMappedRoad() {
		Map<String, DraftFlags> flags = new Fixtures().mappedRoad("r1", "LINESTRING (0 0, 100 0)")
			.road("d1", "LINESTRING (0 20, 100 20)")
			.check(ONLY);
		checkKinds(flags.get("d1"));
	}

	@Test
	void countsAStretchAlongTwoOverlappingMappedRoadsOnce() {
		// r1 and r2 both lie under the draft; merged, the share is still 1
		Flag flag = only(new Fixtures().mappedRoad("r1", "LINESTRING (0 0, 100 0)")
			.mappedRoad("r2", "LINESTRING (0 1, 100 1)")
			.road("d1", "LINESTRING (10 2, 90 2)")
			.check(ONLY), "d1", FlagKind.MAPPED_ALREADY);
		assertThat(flag.value("share")).isCloseTo(1, within(1e-9));
		assertThat(flag.value("hausdorffMetres")).isCloseTo(1, within(1e-3));
	}

	@Test
	void flagsABuildingDrawnAgainOneMetreOff() {
		// the outline moved 1 m east: the farthest vertices, (11, 0) and (11, 10), are 1
		// m
		// from the mapped corners; every edge lies within 1 m of a mapped edge
		Flag flag = only(new Fixtures().mappedBuilding("b1", "POLYGON ((0 0, 10 0, 10 10, 0 10, 0 0))")
			.building("d1", "POLYGON ((1 0, 11 0, 11 10, 1 10, 1 0))")
			.check(ONLY), "d1", FlagKind.MAPPED_ALREADY);
		assertThat(flag.value("share")).isCloseTo(1, within(1e-9));
		assertThat(flag.value("hausdorffMetres")).isCloseTo(1, within(1e-3));
	}

	@Test
	void measuresRoadsOnlyAgainstRoadsAndBuildingsOnlyAgainstBuildings() {
		Map<String, DraftFlags> flags = new Fixtures().mappedBuilding("b1", "POLYGON ((0 0, 100 0, 100 10, 0 10, 0 0))")
			.road("d1", "LINESTRING (0 1, 100 1)")
			.check(ONLY);
		checkKinds(flags.get("d1"));
	}

	@Test
	void raisesNothingWhenSwitchedOff() {
		Map<String, DraftFlags> flags = new Fixtures().mappedRoad("r1", "LINESTRING (0 0, 200 0)")
			.road("d1", "LINESTRING (20 3, 180 3)")
			.check(CheckSettings.NONE);
		checkKinds(flags.get("d1"));
	}

	static Flag only(Map<String, DraftFlags> flags, String id, FlagKind kind) {
		checkKinds(flags.get(id), kind);
		return flags.get(id).flags().get(0);
	}

}
