package org.assay.checks;

import java.util.Map;

import org.junit.jupiter.api.Test;

import static org.assay.checks.Fixtures.checkKinds;
import static org.assay.checks.Fixtures.checkPoint;
import static org.assay.checks.MappedAlreadyCheckTests.only;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * Tests for {@link LineShapeCheck}. Geometries in metres (see {@link Fixtures}), each
 * road at least 15 m long unless the test is about that.
 */
class LineShapeCheckTests {

	private static final CheckSettings ONLY = CheckSettings.NONE.with(ShapeSettings.DEFAULTS);

	@Test
	void flagsALineThatCrossesItself() {
		// the last segment, (100, 50) to (20, -30), meets y = 0 at 50/80 of its way: at
		// (100 - 0.625 x 80, 0) = (50, 0); the turns are 90 and 135 degrees, no spikes
		Flag flag = one("LINESTRING (0 0, 100 0, 100 50, 20 -30)", FlagKind.SELF_CROSSING);
		assertThat(flag.value("crossings")).isEqualTo(1);
		checkPoint(flag, 50, 0);
	}

	@Test
	void doesNotTakeAClosedLoopForACrossing() {
		checkKinds(check("LINESTRING (0 0, 100 0, 100 100, 0 100, 0 0)"));
	}

	@Test
	void flagsRepeatedPoints() {
		// (10, 0) to (10.01, 0) is 1 cm, under 5 cm
		Flag flag = one("LINESTRING (0 0, 10 0, 10.01 0, 30 0)", FlagKind.REPEATED_POINT);
		assertThat(flag.value("count")).isEqualTo(1);
		checkPoint(flag, 10.01, 0);
	}

	@Test
	void flagsASpike() {
		// at (50, 0) the line comes in heading east and leaves towards (-40, 1):
		// 180 - atan(1/40) = 178.568 degrees
		Flag flag = one("LINESTRING (0 0, 50 0, 10 1)", FlagKind.SPIKE);
		assertThat(flag.value("turnDegrees")).isCloseTo(180 - Math.toDegrees(Math.atan(1.0 / 40)), within(1e-6));
		checkPoint(flag, 50, 0);
	}

	@Test
	void seesASpikeBehindARepeatedPoint() {
		// the repeated (50, 0) is passed over: the turn is measured from (0, 0) to (10,
		// 1)
		Map<String, DraftFlags> flags = new Fixtures().road("d1", "LINESTRING (0 0, 50 0, 50 0, 10 1)").check(ONLY);
		checkKinds(flags.get("d1"), FlagKind.REPEATED_POINT, FlagKind.SPIKE);
	}

	@Test
	void doesNotTakeARightAngleForASpike() {
		checkKinds(check("LINESTRING (0 0, 50 0, 50 50)"));
	}

	@Test
	void flagsShortSegments() {
		// 20 to 20.3 is 0.3 m: more than 5 cm, less than 0.5 m
		Flag flag = one("LINESTRING (0 0, 20 0, 20.3 0, 40 0)", FlagKind.SHORT_SEGMENT);
		assertThat(flag.value("count")).isEqualTo(1);
		assertThat(flag.value("shortestMetres")).isCloseTo(0.3, within(1e-4));
		checkPoint(flag, 20.15, 0);
	}

	@Test
	void flagsAShortRoad() {
		Flag flag = one("LINESTRING (0 0, 6 8)", FlagKind.SHORT_ROAD);
		// 3-4-5: sqrt(6² + 8²) = 10 m
		assertThat(flag.value("lengthMetres")).isCloseTo(10, within(1e-3));
	}

	@Test
	void passesAPlainRoad() {
		checkKinds(check("LINESTRING (0 0, 30 0, 60 10)"));
	}

	@Test
	void switchesOneFlagOffWithALimitOfZero() {
		CheckSettings noShortRoads = CheckSettings.NONE.with(new ShapeSettings(true, 0.05, 150, 0.5, 0));
		Map<String, DraftFlags> flags = new Fixtures().road("d1", "LINESTRING (0 0, 6 8)").check(noShortRoads);
		checkKinds(flags.get("d1"));
	}

	private static DraftFlags check(String wkt) {
		return new Fixtures().road("d1", wkt).check(ONLY).get("d1");
	}

	private static Flag one(String wkt, FlagKind kind) {
		return only(new Fixtures().road("d1", wkt).check(ONLY), "d1", kind);
	}

}
