package org.assay.demo;

import java.util.ArrayList;
import java.util.List;

import org.assay.demo.DemoWorld.Road;
import org.assay.demo.DemoWorld.RoadClass;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Polygon;

/**
 * The streets of a village: a small grid at a random angle around its centre, three or
 * four streets each way about 100 m apart, and a ring street around the grid.
 */
final class StreetPlanner {

	private StreetPlanner() {
	}

	static List<Road> plan(Coordinate centre, DemoRandom random, IdSequence ids) {
		double angle = random.uniform(0, Math.PI / 2);
		double spacing = random.uniform(85, 115);
		int along = random.between(3, 4);
		int across = random.between(3, 4);
		List<Road> streets = new ArrayList<>();
		double reach = gridLines(streets, centre, angle, spacing, along, across, random, ids);
		gridLines(streets, centre, angle + Math.PI / 2, spacing, across, along, random, ids);
		streets.add(ring(centre, reach + random.uniform(60, 90), random, ids));
		return streets;
	}

	/**
	 * Parallel streets in one direction; each reaches a little beyond the outermost cross
	 * streets.
	 * @return how far the streets reach from the centre
	 */
	private static double gridLines(List<Road> streets, Coordinate centre, double angle, double spacing, int count,
			int crossCount, DemoRandom random, IdSequence ids) {
		double cos = StrictMath.cos(angle);
		double sin = StrictMath.sin(angle);
		double reach = (crossCount - 1) / 2.0 * spacing + random.uniform(30, 60);
		for (int i = 0; i < count; i++) {
			double offset = (i - (count - 1) / 2.0) * spacing + random.uniform(-8, 8);
			double start = -reach + random.uniform(-15, 15);
			double end = reach + random.uniform(-15, 15);
			double sway = random.uniform(-4, 4);
			double ox = centre.x - offset * sin;
			double oy = centre.y + offset * cos;
			LineString line = MetricLines.sample((t) -> {
				double u = start + t * (end - start);
				double v = sway * StrictMath.sin(Math.PI * t);
				return new Coordinate(ox + u * cos - v * sin, oy + u * sin + v * cos);
			}, 30, 50, random);
			streets.add(street(line, random, ids));
		}
		return reach;
	}

	private static Road ring(Coordinate centre, double radius, DemoRandom random, IdSequence ids) {
		int vertices = (int) Math.round(2 * Math.PI * radius / 40);
		Polygon blob = Shapes.blob(centre, radius, radius, 0.12, vertices, random);
		LineString ring = blob.getExteriorRing();
		Road road = street(LocalFrame.METRES.createLineString(ring.getCoordinateSequence()), random, ids);
		return new Road(road.id(), road.roadClass(), road.widthMetres() + 0.5, road.geometry());
	}

	private static Road street(LineString line, DemoRandom random, IdSequence ids) {
		double width = 0.5 * Math.round(2 * random.uniform(4, 5.5));
		return new Road(ids.next(), RoadClass.STREET, width, line);
	}

}
