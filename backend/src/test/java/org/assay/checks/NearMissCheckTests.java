package org.assay.checks;

import java.util.Map;

import org.junit.jupiter.api.Test;

import static org.assay.checks.Fixtures.checkKinds;
import static org.assay.checks.Fixtures.checkPoint;
import static org.assay.checks.MappedAlreadyCheckTests.only;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * Tests for {@link NearMissCheck}. Geometries in metres (see {@link Fixtures}).
 */
class NearMissCheckTests {

	private static final CheckSettings ONLY = CheckSettings.NONE.with(NearMissSettings.DEFAULTS);

	private static final String CROSS_ROAD = "LINESTRING (105 -50, 105 50)";

	@Test
	void flagsAnEndThatStopsFiveMetresShortOfAMappedRoad() {
		// the end (100, 0) is 5 m from the road x = 105; the join point is (105, 0); the
		// start (0, 0) is 105 m away and free
		Flag flag = only(new Fixtures().mappedRoad("r1", CROSS_ROAD).road("d1", "LINESTRING (0 0, 100 0)").check(ONLY),
				"d1", FlagKind.NEAR_MISS);
		assertThat(flag.value("gapMetres")).isCloseTo(5, within(1e-3));
		checkPoint(flag, 105, 0);
		assertThat(flag.otherId()).isEqualTo("r1");
	}

	@Test
	void takesAGapUnderOneMetreForTouching() {
		Map<String, DraftFlags> flags = new Fixtures().mappedRoad("r1", CROSS_ROAD)
			.road("d1", "LINESTRING (0 0, 104.5 0)")
			.check(ONLY);
		checkKinds(flags.get("d1"));
	}

	@Test
	void takesAGapOverTenMetresForNoMiss() {
		// 105 - 90 = 15 m
		Map<String, DraftFlags> flags = new Fixtures().mappedRoad("r1", CROSS_ROAD)
			.road("d1", "LINESTRING (0 0, 90 0)")
			.check(ONLY);
		checkKinds(flags.get("d1"));
	}

	@Test
	void doesNotFlagAnEndNearARoadThatTheDraftCrossesElsewhere() {
		// the end (108, 20) is 3 m from x = 105, but the draft crosses the road at (105,
		// 0)
		Map<String, DraftFlags> flags = new Fixtures().mappedRoad("r1", CROSS_ROAD)
			.road("d1", "LINESTRING (0 0, 120 0, 120 20, 108 20)")
			.check(ONLY);
		checkKinds(flags.get("d1"));
	}

	@Test
	void flagsBothDraftsOfAGapBetweenTwoDrafts() {
		// d1 ends at (100, 0), d2 starts at (103, 0): 3 m each way
		Map<String, DraftFlags> flags = new Fixtures().road("d1", "LINESTRING (0 0, 100 0)")
			.road("d2", "LINESTRING (103 0, 200 0)")
			.check(ONLY);
		Flag first = only(flags, "d1", FlagKind.NEAR_MISS);
		Flag second = only(flags, "d2", FlagKind.NEAR_MISS);
		assertThat(first.value("gapMetres")).isCloseTo(3, within(1e-3));
		assertThat(first.otherId()).isEqualTo("d2");
		checkPoint(first, 103, 0);
		assertThat(second.value("gapMetres")).isCloseTo(3, within(1e-3));
		checkPoint(second, 100, 0);
	}

	@Test
	void doesNotTakeTheDraftsOwnOtherPartForAnotherRoad() {
		Map<String, DraftFlags> flags = new Fixtures().road("d1", "MULTILINESTRING ((0 0, 100 0), (103 0, 200 0))")
			.check(ONLY);
		checkKinds(flags.get("d1"));
	}

	@Test
	void flagsEachEndOnItsOwn() {
		// both ends stop 4 m short of a mapped road: x = -4 and x = 104
		Map<String, DraftFlags> flags = new Fixtures().mappedRoad("r1", "LINESTRING (-4 -50, -4 50)")
			.mappedRoad("r2", "LINESTRING (104 -50, 104 50)")
			.road("d1", "LINESTRING (0 0, 100 0)")
			.check(ONLY);
		checkKinds(flags.get("d1"), FlagKind.NEAR_MISS, FlagKind.NEAR_MISS);
		assertThat(flags.get("d1").flags()).extracting(Flag::otherId).containsExactly("r1", "r2");
	}

}
