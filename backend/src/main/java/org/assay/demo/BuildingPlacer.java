package org.assay.demo;

import java.util.ArrayList;
import java.util.List;

import org.assay.demo.DemoWorld.Building;
import org.assay.demo.DemoWorld.Road;
import org.assay.demo.DemoWorld.RoadClass;
import org.assay.demo.DemoWorld.Woods;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.geom.prep.PreparedGeometry;
import org.locationtech.jts.geom.prep.PreparedGeometryFactory;

/**
 * Buildings along the village streets, on both sides, facing the street: rectangles of 8
 * to 25 m a side, some L-shaped, a few with a detached outbuilding behind (a
 * MultiPolygon). A building keeps clear of every road, of the woods and of the other
 * buildings; a plot where it would not fits none.
 */
final class BuildingPlacer {

	private static final double BUILDING_GAP = 2.5;

	private final DemoRandom random;

	private final PreparedGeometry inland;

	private final ClearanceIndex obstacles = new ClearanceIndex();

	private final IdSequence ids = new IdSequence("bldg-%04d");

	private BuildingPlacer(Polygon coast, DemoRandom random) {
		this.random = random;
		this.inland = PreparedGeometryFactory.prepare(coast.buffer(-30));
	}

	static List<Building> place(Polygon coast, List<Road> roads, List<Woods> woods, DemoRandom random) {
		BuildingPlacer placer = new BuildingPlacer(coast, random);
		for (Road road : roads) {
			placer.obstacles.addSegments(road.geometry(), road.widthMetres() / 2 + 1.5, "road");
		}
		for (Woods patch : woods) {
			placer.obstacles.add(patch.geometry(), 5, "woods");
		}
		List<Building> buildings = new ArrayList<>();
		for (Road road : roads) {
			if (road.roadClass() == RoadClass.STREET) {
				placer.alongStreet(road, buildings);
			}
		}
		return buildings;
	}

	private void alongStreet(Road street, List<Building> buildings) {
		double length = street.geometry().getLength();
		for (double at = this.random.uniform(10, 25); at < length - 10; at += this.random.uniform(24, 40)) {
			Coordinate point = MetricLines.pointAt(street.geometry(), at);
			double direction = MetricLines.directionAt(street.geometry(), at);
			for (int side = -1; side <= 1; side += 2) {
				if (this.random.chance(0.62)) {
					plot(point, direction, side, street.widthMetres(), buildings);
				}
			}
		}
	}

	private void plot(Coordinate point, double direction, int side, double streetWidth, List<Building> buildings) {
		double front = this.random.uniform(8, 16);
		double depth = this.random.uniform(8, 20);
		double setback = streetWidth / 2 + this.random.uniform(4, 9) + depth / 2;
		double nx = -StrictMath.sin(direction) * side;
		double ny = StrictMath.cos(direction) * side;
		Coordinate centre = new Coordinate(point.x + setback * nx, point.y + setback * ny);
		double shape = this.random.uniform(0, 1);
		Geometry outline;
		String buildingClass = (front * depth > 240) ? "barn" : "house";
		if (shape < 0.16 && front >= 11 && depth >= 11) {
			double notchWidth = this.random.uniform(4, front - 5);
			double notchDepth = this.random.uniform(4, depth - 5);
			outline = Shapes.lShape(centre, direction, front, depth, notchWidth, notchDepth);
			buildingClass = "house";
		}
		else if (shape > 0.96) {
			Polygon house = Shapes.rectangle(centre, direction, front, depth);
			double behind = depth / 2 + 4 + 4.5;
			Coordinate shedCentre = new Coordinate(centre.x + behind * nx, centre.y + behind * ny);
			Polygon shed = Shapes.rectangle(shedCentre, direction, this.random.uniform(8, 10), 8.5);
			outline = LocalFrame.METRES.createMultiPolygon(new Polygon[] { house, shed });
		}
		else {
			outline = Shapes.rectangle(centre, direction, front, depth);
		}
		if (this.inland.contains(outline) && this.obstacles.isClear(outline)) {
			this.obstacles.add(outline, BUILDING_GAP, "building");
			buildings.add(new Building(this.ids.next(), buildingClass, outline));
		}
	}

}
