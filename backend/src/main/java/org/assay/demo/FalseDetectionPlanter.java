package org.assay.demo;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import org.assay.demo.DemoWorld.Field;
import org.assay.demo.DemoWorld.Woods;
import org.assay.geo.FeatureKind;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.geom.prep.PreparedGeometry;
import org.locationtech.jts.geom.prep.PreparedGeometryFactory;

/**
 * What the model drafts where nothing is: roads along field edges, dry stream beds and
 * the shadows along the edges of woods, and box-shaped buildings in the woods and in the
 * fields. Each false road keeps at least 10 m from every true road, so that it cannot be
 * taken for a shifted one.
 */
final class FalseDetectionPlanter {

	private static final int ROADS = 230;

	private static final int BUILDINGS = 55;

	private final DemoWorld world;

	private final DemoRandom random;

	private final ClearanceIndex realThings = new ClearanceIndex();

	private final PreparedGeometry inland;

	private FalseDetectionPlanter(DemoWorld world, DemoRandom random) {
		this.world = world;
		this.random = random;
		world.roads().forEach((r) -> this.realThings.addSegments(r.geometry(), r.widthMetres() / 2 + 10, "road"));
		world.buildings().forEach((b) -> this.realThings.add(b.geometry(), 8, "building"));
		this.inland = PreparedGeometryFactory.prepare(world.coastline().buffer(-150));
	}

	static List<DraftPlan> plant(DemoWorld world, DemoRandom random) {
		FalseDetectionPlanter planter = new FalseDetectionPlanter(world, random);
		List<DraftPlan> plans = new ArrayList<>();
		for (int attempt = 0; attempt < 20 * ROADS && plans.size() < ROADS; attempt++) {
			double kind = random.uniform(0, 1);
			DraftPlan plan = (kind < 0.5) ? planter.fieldEdge() : (kind < 0.75) ? planter.stream() : planter.shadow();
			if (plan != null) {
				plans.add(plan);
			}
		}
		int roads = plans.size();
		for (int attempt = 0; attempt < 20 * BUILDINGS && plans.size() < roads + BUILDINGS; attempt++) {
			DraftPlan plan = random.chance(0.7) ? planter.boxInWoods() : planter.boxInField();
			if (plan != null) {
				plans.add(plan);
			}
		}
		return plans;
	}

	private DraftPlan fieldEdge() {
		Field field = this.random.pick(this.world.fields());
		Coordinate[] ring = field.geometry().getExteriorRing().getCoordinates();
		int start = this.random.between(0, ring.length - 2);
		int edges = this.random.between(1, 2);
		Coordinate[] corners = new Coordinate[edges + 1];
		for (int i = 0; i <= edges; i++) {
			corners[i] = ring[(start + i) % (ring.length - 1)].copy();
		}
		return road(LocalFrame.METRES.createLineString(corners), "field boundary of " + field.id());
	}

	private DraftPlan stream() {
		Envelope box = this.world.bounds();
		Coordinate start = new Coordinate(this.random.uniform(box.getMinX(), box.getMaxX()),
				this.random.uniform(box.getMinY(), box.getMaxY()));
		if (!this.inland.contains(LocalFrame.METRES.createPoint(start))) {
			return null;
		}
		List<Coordinate> bed = MetricLines.walk(start, this.random.angle(), this.random.uniform(150, 600), 10, 0.12,
				(p) -> this.inland.contains(LocalFrame.METRES.createPoint(p)), this.random);
		if (bed.size() < 15) {
			return null;
		}
		LineString line = LocalFrame.METRES.createLineString(bed.toArray(Coordinate[]::new));
		boolean underTrees = this.world.woods().stream().anyMatch((w) -> w.geometry().intersects(line));
		return underTrees ? null : road(line, "dry stream bed");
	}

	private DraftPlan shadow() {
		Woods woods = this.random.pick(this.world.woods());
		LineString edge = woods.geometry().getExteriorRing();
		double length = this.random.uniform(60, 200);
		double from = this.random.uniform(0, edge.getLength() - length);
		Coordinate[] points = MetricLines.extract(edge, from, from + length).getCoordinates();
		Coordinate centre = woods.geometry().getCentroid().getCoordinate();
		double push = this.random.uniform(6, 10);
		Coordinate[] shadow = Arrays.stream(points).map((p) -> {
			double d = p.distance(centre);
			return new Coordinate(p.x + push * (p.x - centre.x) / d, p.y + push * (p.y - centre.y) / d);
		}).toArray(Coordinate[]::new);
		return road(LocalFrame.METRES.createLineString(shadow), "shadow along the edge of " + woods.id());
	}

	private DraftPlan road(LineString line, String detail) {
		LineString drafted = MetricLines.resample(line, 25, 60, 0.8, this.random);
		if (!this.realThings.isClear(drafted)) {
			return null;
		}
		String featureClass = this.random.chance(0.75) ? "track" : "residential";
		return new DraftPlan(FeatureKind.ROAD, drafted, FaultClass.FALSE_DETECTION, featureClass, null, null, null,
				detail);
	}

	private DraftPlan boxInWoods() {
		Woods woods = this.random.pick(this.world.woods());
		return box(woods.geometry(), 8, 16, "bright patch in " + woods.id());
	}

	private DraftPlan boxInField() {
		Field field = this.random.pick(this.world.fields());
		return box(field.geometry(), 8, 14, "bale stack or bare patch in " + field.id());
	}

	private DraftPlan box(Polygon area, double smallest, double largest, String detail) {
		Geometry inner = area.buffer(-4);
		Envelope box = inner.getEnvelopeInternal();
		for (int attempt = 0; attempt < 20; attempt++) {
			Coordinate centre = new Coordinate(this.random.uniform(box.getMinX(), box.getMaxX()),
					this.random.uniform(box.getMinY(), box.getMaxY()));
			Polygon outline = Shapes.rectangle(centre, this.random.uniform(0, Math.PI),
					this.random.uniform(smallest, largest), this.random.uniform(smallest, largest - 2));
			if (inner.contains(outline)) {
				String featureClass = this.random.chance(0.6) ? "house" : "barn";
				return new DraftPlan(FeatureKind.BUILDING, outline, FaultClass.FALSE_DETECTION, featureClass, null,
						null, null, detail);
			}
		}
		return null;
	}

}
