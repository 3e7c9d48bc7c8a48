package org.assay.demo;

import java.util.ArrayList;
import java.util.List;

import org.assay.demo.DemoWorld.Building;
import org.assay.demo.DemoWorld.Field;
import org.assay.demo.DemoWorld.HiddenStretch;
import org.assay.demo.DemoWorld.Road;
import org.assay.demo.DemoWorld.Village;
import org.assay.demo.DemoWorld.Woods;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Polygon;

/**
 * Generates the true world of the demo island in the metric frame of {@link LocalFrame}:
 * coast, villages, main roads, streets, tracks, woods (and the road stretches they hide),
 * buildings and fields, in that order. Each step draws from its own random stream, so the
 * world is the same for the same seed.
 */
final class DemoWorldGenerator {

	private DemoWorldGenerator() {
	}

	/**
	 * Generates the world.
	 * @param seed the scenario seed
	 * @return the world, in metres
	 */
	static DemoWorld generate(long seed) {
		Polygon coast = IslandPlanner.coastline(DemoRandom.forStage(seed, "coast"));
		List<Coordinate> centres = IslandPlanner.villageCentres(DemoNames.VILLAGES.size(),
				DemoRandom.forStage(seed, "villages"));
		List<Road> roads = roads(seed, coast, centres);
		List<Woods> woods = WoodsPlanner.plan(coast, centres, roads, DemoRandom.forStage(seed, "woods"));
		List<HiddenStretch> hidden = HiddenStretchFinder.find(roads, woods);
		List<Building> buildings = BuildingPlacer.place(coast, roads, woods, DemoRandom.forStage(seed, "buildings"));
		List<Field> fields = FieldPlanner.plan(coast, centres, roads, woods, buildings,
				DemoRandom.forStage(seed, "fields"));
		return new DemoWorld(DemoNames.ISLAND, coast, villages(centres), roads, buildings, woods, fields, hidden);
	}

	private static List<Road> roads(long seed, Polygon coast, List<Coordinate> centres) {
		IdSequence ids = new IdSequence("road-%04d");
		List<Road> roads = new ArrayList<>(
				MainRoadPlanner.plan(centres, coast, DemoRandom.forStage(seed, "main-roads"), ids));
		DemoRandom streets = DemoRandom.forStage(seed, "streets");
		for (Coordinate centre : centres) {
			roads.addAll(StreetPlanner.plan(centre, streets, ids));
		}
		roads.addAll(TrackPlanner.plan(roads, coast, centres, DemoRandom.forStage(seed, "tracks"), ids));
		return roads;
	}

	private static List<Village> villages(List<Coordinate> centres) {
		List<Village> villages = new ArrayList<>();
		for (int i = 0; i < centres.size(); i++) {
			villages.add(new Village(DemoNames.VILLAGES.get(i), LocalFrame.METRES.createPoint(centres.get(i))));
		}
		return villages;
	}

}
