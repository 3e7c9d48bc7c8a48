package org.assay.demo;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.assay.demo.DemoWorld.Building;
import org.assay.demo.DemoWorld.Road;
import org.assay.demo.DemoWorld.RoadClass;
import org.assay.geo.FeatureKind;
import org.locationtech.jts.geom.LineString;

/**
 * The reference layer derived from the true world: 60% of the main roads and streets (a
 * quarter of those only mapped from their start up to 35-75% of their length, so that
 * drafts can continue them) and half of the buildings, in their exact true geometry.
 * Tracks are not mapped yet. Metric geometries.
 */
final class ReferenceLayer {

	static final double ROAD_SHARE = 0.6;

	static final double PARTLY_MAPPED_SHARE = 0.35;

	private final List<DemoReferenceFeature> features = new ArrayList<>();

	private final Map<String, String> referenceIdOfWorldId = new HashMap<>();

	private final Map<String, Double> mappedLength = new HashMap<>();

	private ReferenceLayer() {
	}

	static ReferenceLayer derive(DemoWorld world, DemoRandom random) {
		ReferenceLayer layer = new ReferenceLayer();
		List<Road> mappable = new ArrayList<>(
				world.roads().stream().filter((r) -> r.roadClass() != RoadClass.TRACK).toList());
		Set<String> chosenRoads = choose(mappable.stream().map(Road::id).toList(), ROAD_SHARE, random);
		Set<String> chosenBuildings = choose(world.buildings().stream().map(Building::id).toList(), 0.5, random);
		IdSequence roadIds = new IdSequence("ref-r-%04d");
		for (Road road : mappable) {
			if (chosenRoads.contains(road.id())) {
				layer.addRoad(road, roadIds.next(), random);
			}
		}
		IdSequence buildingIds = new IdSequence("ref-b-%04d");
		for (Building building : world.buildings()) {
			if (chosenBuildings.contains(building.id())) {
				String id = buildingIds.next();
				layer.referenceIdOfWorldId.put(building.id(), id);
				layer.features.add(new DemoReferenceFeature(id, FeatureKind.BUILDING, building.geometry(),
						building.buildingClass(), random.chance(0.7) ? "field survey" : "earlier tracing"));
			}
		}
		return layer;
	}

	private void addRoad(Road road, String id, DemoRandom random) {
		LineString line = road.geometry();
		double length = line.getLength();
		double mapped = length;
		if (length >= 250 && random.chance(PARTLY_MAPPED_SHARE)) {
			mapped = length * random.uniform(0.35, 0.75);
			line = MetricLines.extract(line, 0, mapped);
		}
		this.referenceIdOfWorldId.put(road.id(), id);
		this.mappedLength.put(road.id(), mapped);
		this.features.add(new DemoReferenceFeature(id, FeatureKind.ROAD, line, road.roadClass().jsonClass(),
				random.chance(0.7) ? "field survey" : "earlier tracing"));
	}

	/** Exactly {@code round(share · n)} of the ids, drawn without replacement. */
	private static Set<String> choose(List<String> ids, double share, DemoRandom random) {
		List<String> shuffled = new ArrayList<>(ids);
		random.shuffle(shuffled);
		return new HashSet<>(shuffled.subList(0, (int) Math.round(share * ids.size())));
	}

	List<DemoReferenceFeature> features() {
		return this.features;
	}

	/** The reference id of a true feature, or {@code null} when it is not mapped. */
	String referenceIdOf(String worldId) {
		return this.referenceIdOfWorldId.get(worldId);
	}

	/** How far along a road is mapped from its start: 0 when not mapped at all. */
	double mappedLength(String roadId) {
		return this.mappedLength.getOrDefault(roadId, 0.0);
	}

}
