package org.assay.demo;

import java.util.ArrayList;
import java.util.List;

import org.assay.demo.DemoWorld.Building;
import org.assay.demo.DemoWorld.Field;
import org.assay.demo.DemoWorld.Road;
import org.assay.demo.DemoWorld.Woods;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.geom.prep.PreparedGeometry;
import org.locationtech.jts.geom.prep.PreparedGeometryFactory;

/**
 * Fields in the open country: slightly irregular quadrilaterals of 60 to 240 m a side,
 * clear of the roads, the woods, the buildings, the villages and each other. They are
 * there for the imagery, and their edges are where the model sees roads that are not.
 */
final class FieldPlanner {

	private static final int FIELDS = 320;

	private static final List<String> COVERS = List.of("crop", "crop", "pasture", "pasture", "fallow", "orchard");

	private FieldPlanner() {
	}

	static List<Field> plan(Polygon coast, List<Coordinate> villages, List<Road> roads, List<Woods> woods,
			List<Building> buildings, DemoRandom random) {
		ClearanceIndex obstacles = new ClearanceIndex();
		roads.forEach((r) -> obstacles.addSegments(r.geometry(), r.widthMetres() / 2 + 4, "road"));
		woods.forEach((w) -> obstacles.add(w.geometry(), 6, "woods"));
		buildings.forEach((b) -> obstacles.add(b.geometry(), 10, "building"));
		PreparedGeometry inland = PreparedGeometryFactory.prepare(coast.buffer(-40));
		Envelope box = coast.getEnvelopeInternal();
		List<Field> fields = new ArrayList<>();
		for (int attempt = 0; attempt < 5000 && fields.size() < FIELDS; attempt++) {
			Coordinate centre = new Coordinate(random.uniform(box.getMinX(), box.getMaxX()),
					random.uniform(box.getMinY(), box.getMaxY()));
			if (villages.stream().anyMatch((v) -> v.distance(centre) < 420)) {
				continue;
			}
			Polygon field = quadrilateral(centre, random);
			if (inland.contains(field) && obstacles.isClear(field)) {
				obstacles.add(field, 5, "field");
				fields.add(new Field(String.format("field-%04d", fields.size() + 1), random.pick(COVERS), field));
			}
		}
		return fields;
	}

	/**
	 * A rectangle with each corner moved by up to 8 m: still simple, as the sides are 60
	 * m or more.
	 */
	private static Polygon quadrilateral(Coordinate centre, DemoRandom random) {
		Polygon rectangle = Shapes.rectangle(centre, random.uniform(0, Math.PI), random.uniform(80, 240),
				random.uniform(60, 170));
		Coordinate[] ring = rectangle.getExteriorRing().getCoordinates().clone();
		for (int i = 0; i < ring.length - 1; i++) {
			ring[i] = new Coordinate(ring[i].x + random.uniform(-8, 8), ring[i].y + random.uniform(-8, 8));
		}
		ring[ring.length - 1] = ring[0].copy();
		return LocalFrame.METRES.createPolygon(ring);
	}

}
