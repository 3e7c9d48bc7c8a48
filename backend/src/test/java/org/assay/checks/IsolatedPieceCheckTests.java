package org.assay.checks;

import java.util.Map;

import org.junit.jupiter.api.Test;

import static org.assay.checks.Fixtures.checkKinds;
import static org.assay.checks.MappedAlreadyCheckTests.only;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * Tests for {@link IsolatedPieceCheck}. Geometries in metres (see {@link Fixtures}); the
 * groups lie 100 m apart, out of each other's reach.
 */
class IsolatedPieceCheckTests {

	private static final CheckSettings ONLY = CheckSettings.NONE.with(IsolationSettings.DEFAULTS);

	@Test
	void flagsEveryDraftOfAShortSetThatTouchesNoMappedRoad() {
		// d1 and d2 are 0.5 m apart, so they touch: 50 + 69.5 = 119.5 m < 200 m
		Map<String, DraftFlags> flags = new Fixtures().road("d1", "LINESTRING (0 0, 50 0)")
			.road("d2", "LINESTRING (50.5 0, 120 0)")
			.check(ONLY);
		for (String id : new String[] { "d1", "d2" }) {
			Flag flag = only(flags, id, FlagKind.ISOLATED_PIECE);
			assertThat(flag.value("totalMetres")).isCloseTo(119.5, within(1e-3));
			assertThat(flag.value("drafts")).isEqualTo(2);
		}
	}

	@Test
	void doesNotFlagASetOfTwoHundredMetresOrMore() {
		// 150 + 100 = 250 m, joined at (150, 100)
		Map<String, DraftFlags> flags = new Fixtures().road("d3", "LINESTRING (0 100, 150 100)")
			.road("d4", "LINESTRING (150 100, 250 100)")
			.check(ONLY);
		checkKinds(flags.get("d3"));
		checkKinds(flags.get("d4"));
	}

	@Test
	void doesNotFlagAShortSetThatTouchesAMappedRoad() {
		// d5 ends 0.5 m from r1 and d6 hangs on d5
		Map<String, DraftFlags> flags = new Fixtures().mappedRoad("r1", "LINESTRING (50.5 150, 50.5 250)")
			.road("d5", "LINESTRING (0 200, 50 200)")
			.road("d6", "LINESTRING (0 200, 0 250)")
			.check(ONLY);
		checkKinds(flags.get("d5"));
		checkKinds(flags.get("d6"));
	}

	@Test
	void takesAGapOfOneMetreOrMoreForNoTouch() {
		// d7 and d8 are 2 m apart: two sets of 100 m each, both isolated alone
		Map<String, DraftFlags> flags = new Fixtures().road("d7", "LINESTRING (0 300, 100 300)")
			.road("d8", "LINESTRING (102 300, 202 300)")
			.check(ONLY);
		assertThat(only(flags, "d7", FlagKind.ISOLATED_PIECE).value("drafts")).isEqualTo(1);
		assertThat(only(flags, "d8", FlagKind.ISOLATED_PIECE).value("totalMetres")).isCloseTo(100, within(1e-3));
	}

	@Test
	void joinsDraftsThroughAChain() {
		// d9 - d10 - d11 in a chain, 3 x 80 = 240 m: not isolated although d9 and d11
		// never
		// touch
		Map<String, DraftFlags> flags = new Fixtures().road("d9", "LINESTRING (0 400, 80 400)")
			.road("d11", "LINESTRING (160 400, 240 400)")
			.road("d10", "LINESTRING (80 400, 160 400)")
			.check(ONLY);
		checkKinds(flags.get("d9"));
		checkKinds(flags.get("d10"));
		checkKinds(flags.get("d11"));
	}

	@Test
	void doesNotJoinRoadsThatOnlyCross() {
		// d12 crosses d13 and r2 in the middle, with no vertex there: 100 m alone
		Map<String, DraftFlags> flags = new Fixtures().mappedRoad("r2", "LINESTRING (50 450, 50 550)")
			.road("d12", "LINESTRING (0 500, 100 500)")
			.road("d13", "LINESTRING (30 480, 30 520)")
			.check(ONLY);
		assertThat(only(flags, "d12", FlagKind.ISOLATED_PIECE).value("drafts")).isEqualTo(1);
	}

	@Test
	void joinsRoadsThatShareAVertex() {
		// d14 and d15 cross at their common vertex (50, 600), and d15 shares (70, 600)
		// with
		// r3 in the middle of both: joined to a mapped road
		Map<String, DraftFlags> flags = new Fixtures().mappedRoad("r3", "LINESTRING (70 550, 70 600, 70 650)")
			.road("d14", "LINESTRING (50 580, 50 600, 50 620)")
			.road("d15", "LINESTRING (0 600, 50 600, 70 600, 100 600)")
			.check(ONLY);
		checkKinds(flags.get("d14"));
		checkKinds(flags.get("d15"));
	}

	@Test
	void leavesBuildingsOut() {
		Map<String, DraftFlags> flags = new Fixtures().building("b1", "POLYGON ((0 0, 10 0, 10 10, 0 10, 0 0))")
			.check(ONLY);
		checkKinds(flags.get("b1"));
	}

}
