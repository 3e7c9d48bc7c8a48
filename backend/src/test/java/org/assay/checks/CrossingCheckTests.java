package org.assay.checks;

import java.util.Map;

import org.junit.jupiter.api.Test;

import static org.assay.checks.Fixtures.checkKinds;
import static org.assay.checks.Fixtures.checkPoint;
import static org.assay.checks.MappedAlreadyCheckTests.only;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * Tests for {@link CrossingCheck}. Geometries in metres (see {@link Fixtures}).
 */
class CrossingCheckTests {

	private static final CheckSettings ONLY = CheckSettings.NONE.with(CrossingSettings.DEFAULTS);

	@Test
	void flagsARoadThatCrossesAMappedRoadWithoutAVertex() {
		Flag flag = only(new Fixtures().mappedRoad("r1", "LINESTRING (50 -50, 50 50)")
			.road("d1", "LINESTRING (0 0, 100 0)")
			.check(ONLY), "d1", FlagKind.CROSSING_UNJOINED);
		assertThat(flag.value("angleDegrees")).isCloseTo(90, within(1e-6));
		checkPoint(flag, 50, 0);
		assertThat(flag.otherId()).isEqualTo("r1");
	}

	@Test
	void measuresTheAcuteAngleOfTheCrossing() {
		// (40, -10) to (60, 10) rises at 45 degrees and meets y = 0 at x = 50
		Flag flag = only(new Fixtures().mappedRoad("r1", "LINESTRING (60 10, 40 -10)")
			.road("d1", "LINESTRING (0 0, 100 0)")
			.check(ONLY), "d1", FlagKind.CROSSING_UNJOINED);
		assertThat(flag.value("angleDegrees")).isCloseTo(45, within(1e-6));
		checkPoint(flag, 50, 0);
	}

	@Test
	void takesASharedVertexForAJunction() {
		Map<String, DraftFlags> flags = new Fixtures().mappedRoad("r1", "LINESTRING (50 -50, 50 0, 50 50)")
			.road("d1", "LINESTRING (0 0, 50 0, 100 0)")
			.check(ONLY);
		checkKinds(flags.get("d1"));
	}

	@Test
	void takesVerticesOfBothRoadsWithinHalfAMetreForAJunction() {
		// they cross at (50, 0); d1 has a vertex 0.3 m away, r1 one 0.2 m away
		Map<String, DraftFlags> flags = new Fixtures().mappedRoad("r1", "LINESTRING (50 -50, 50 0.2, 50 50)")
			.road("d1", "LINESTRING (0 0, 50.3 0, 100 0)")
			.check(ONLY);
		checkKinds(flags.get("d1"));
	}

	@Test
	void takesAVertexOfOnlyOneRoadForNoJunction() {
		// d1 has a vertex 0.3 m from the crossing, r1 has none near it
		Flag flag = only(new Fixtures().mappedRoad("r1", "LINESTRING (50 -50, 50 50)")
			.road("d1", "LINESTRING (0 0, 50.3 0, 100 0)")
			.check(ONLY), "d1", FlagKind.CROSSING_UNJOINED);
		checkPoint(flag, 50, 0);
	}

	@Test
	void takesAnEndThatOvershootsByLessThanTwoMetresForATouch() {
		Map<String, DraftFlags> flags = new Fixtures().mappedRoad("r1", "LINESTRING (50 -50, 50 50)")
			.road("d1", "LINESTRING (0 0, 51.5 0)")
			.check(ONLY);
		checkKinds(flags.get("d1"));
	}

	@Test
	void flagsAnEndThatOvershootsByMoreThanTwoMetres() {
		// d1 runs 3 m past r1
		Flag flag = only(new Fixtures().mappedRoad("r1", "LINESTRING (50 -50, 50 50)")
			.road("d1", "LINESTRING (0 0, 53 0)")
			.check(ONLY), "d1", FlagKind.CROSSING_UNJOINED);
		checkPoint(flag, 50, 0);
	}

	@Test
	void leavesRoadsThatMeetAtAShallowAngleToTheDuplicateCheck() {
		// (0, -1) to (100, 1) crosses y = 0 at atan(2/100) = 1.15 degrees, under 20
		Map<String, DraftFlags> flags = new Fixtures().mappedRoad("r1", "LINESTRING (0 0, 100 0)")
			.road("d1", "LINESTRING (0 -1, 100 1)")
			.check(ONLY);
		checkKinds(flags.get("d1"));
	}

	@Test
	void flagsBothOfTwoDraftsThatCrossAndEachOnlyOncePerOtherRoad() {
		// d2 zigzags across d1 twice: one flag each
		Map<String, DraftFlags> flags = new Fixtures().road("d1", "LINESTRING (0 0, 100 0)")
			.road("d2", "LINESTRING (20 -10, 40 10, 60 -10)")
			.check(ONLY);
		assertThat(only(flags, "d1", FlagKind.CROSSING_UNJOINED).otherId()).isEqualTo("d2");
		assertThat(only(flags, "d2", FlagKind.CROSSING_UNJOINED).otherId()).isEqualTo("d1");
	}

}
