package org.assay.checks;

import java.util.Map;

import org.junit.jupiter.api.Test;

import static org.assay.checks.Fixtures.checkKinds;
import static org.assay.checks.Fixtures.checkPoint;
import static org.assay.checks.MappedAlreadyCheckTests.only;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * Tests for {@link BuildingCheck}. Geometries in metres (see {@link Fixtures}).
 */
class BuildingCheckTests {

	private static final CheckSettings ONLY = CheckSettings.NONE.with(BuildingSettings.DEFAULTS);

	@Test
	void flagsABuildingUnderSixSquareMetres() {
		// 2 m x 2 m = 4 m²
		Flag flag = only(new Fixtures().building("b1", "POLYGON ((0 0, 2 0, 2 2, 0 2, 0 0))").check(ONLY), "b1",
				FlagKind.SMALL_BUILDING);
		assertThat(flag.value("areaSquareMetres")).isCloseTo(4, within(1e-3));
	}

	@Test
	void flagsBothOfTwoOverlappingBuildings() {
		// they share x 8..10, y 0..10: 20 m², a fifth of each 100 m² building
		Map<String, DraftFlags> flags = new Fixtures().building("b1", "POLYGON ((0 0, 10 0, 10 10, 0 10, 0 0))")
			.building("b2", "POLYGON ((8 0, 18 0, 18 10, 8 10, 8 0))")
			.check(ONLY);
		for (String id : new String[] { "b1", "b2" }) {
			Flag flag = only(flags, id, FlagKind.BUILDING_OVERLAP);
			assertThat(flag.value("overlapSquareMetres")).isCloseTo(20, within(1e-3));
			assertThat(flag.value("overlapShare")).isCloseTo(0.2, within(1e-6));
		}
		assertThat(flags.get("b1").flags().get(0).otherId()).isEqualTo("b2");
	}

	@Test
	void doesNotFlagBuildingsThatShareAWall() {
		Map<String, DraftFlags> flags = new Fixtures().building("b1", "POLYGON ((30 0, 40 0, 40 10, 30 10, 30 0))")
			.building("b2", "POLYGON ((40 0, 50 0, 50 10, 40 10, 40 0))")
			.check(ONLY);
		checkKinds(flags.get("b1"));
		checkKinds(flags.get("b2"));
	}

	@Test
	void flagsABuildingThatARoadDraftRunsThrough() {
		// y = 5 from x = -5 to 15 runs 10 m inside the 10 m square
		Map<String, DraftFlags> flags = new Fixtures().building("b1", "POLYGON ((0 0, 10 0, 10 10, 0 10, 0 0))")
			.road("d1", "LINESTRING (-5 5, 15 5)")
			.check(ONLY);
		Flag flag = only(flags, "b1", FlagKind.ROAD_THROUGH_BUILDING);
		assertThat(flag.value("insideMetres")).isCloseTo(10, within(1e-3));
		assertThat(flag.otherId()).isEqualTo("d1");
		checkPoint(flag, 5, 5);
		checkKinds(flags.get("d1"));
	}

	@Test
	void doesNotFlagARoadAlongTheWall() {
		Map<String, DraftFlags> flags = new Fixtures().building("b1", "POLYGON ((0 0, 10 0, 10 10, 0 10, 0 0))")
			.road("d1", "LINESTRING (-5 -1, 15 -1)")
			.check(ONLY);
		checkKinds(flags.get("b1"));
	}

}
