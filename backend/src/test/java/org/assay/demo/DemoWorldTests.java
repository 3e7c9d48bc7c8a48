package org.assay.demo;

import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;

import net.sf.geographiclib.Geodesic;
import org.assay.demo.DemoWorld.Building;
import org.assay.demo.DemoWorld.HiddenStretch;
import org.assay.demo.DemoWorld.Road;
import org.assay.demo.DemoWorld.RoadClass;
import org.assay.demo.DemoWorld.Village;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.algorithm.MinimumAreaRectangle;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.index.strtree.STRtree;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The true world of the demo island, in the generator's metric frame.
 */
class DemoWorldTests {

	private static final long SEED = 7;

	private static DemoWorld world;

	@BeforeAll
	static void generate() {
		world = DemoWorldGenerator.generate(SEED);
	}

	@Test
	void theIslandFitsATwelveByNineKilometreBoxAroundItsCentre() {
		Envelope bounds = world.bounds();
		assertThat(bounds.getMinX()).isGreaterThan(-6000);
		assertThat(bounds.getMaxX()).isLessThan(6000);
		assertThat(bounds.getMinY()).isGreaterThan(-4500);
		assertThat(bounds.getMaxY()).isLessThan(4500);
		assertThat(bounds.getWidth()).isGreaterThan(10000);
		assertThat(bounds.getHeight()).isGreaterThan(7500);
		assertThat(world.coastline().isValid()).isTrue();
		assertThat(world.islandName()).isEqualTo("Brevanor");
	}

	@Test
	void villagesHaveDistinctNamesAndStandWellApartInland() {
		List<Village> villages = world.villages();
		assertThat(villages).hasSizeBetween(6, 8);
		assertThat(villages).extracting(Village::name).doesNotHaveDuplicates();
		for (Village a : villages) {
			assertThat(world.coastline().buffer(-1000).contains(a.centre())).as(a.name()).isTrue();
			for (Village b : villages) {
				if (a != b) {
					assertThat(a.centre().distance(b.centre())).isGreaterThan(1200);
				}
			}
		}
	}

	@Test
	void roadsOfEveryClassStayInlandWithTheirWidths() {
		Set<RoadClass> classes = world.roads().stream().map(Road::roadClass).collect(Collectors.toSet());
		assertThat(classes).containsExactlyInAnyOrder(RoadClass.values());
		for (Road road : world.roads()) {
			assertThat(world.coastline().contains(road.geometry())).as(road.id()).isTrue();
			assertThat(road.geometry().isValid()).isTrue();
			double width = road.widthMetres();
			switch (road.roadClass()) {
				case MAIN -> assertThat(width).isBetween(6.0, 7.5);
				case STREET -> assertThat(width).isBetween(4.0, 6.0);
				case TRACK -> assertThat(width).isBetween(2.5, 3.5);
			}
		}
	}

	@Test
	void mainRoadsHaveAVertexEveryThirtyToEightyMetres() {
		for (Road road : world.roads()) {
			if (road.roadClass() == RoadClass.MAIN) {
				Coordinate[] points = road.geometry().getCoordinates();
				for (int i = 2; i < points.length - 1; i++) {
					assertThat(points[i - 1].distance(points[i])).isBetween(29.0, 81.0);
				}
			}
		}
	}

	@Test
	void buildingsMeasureEightToTwentyFiveMetresAndKeepClearOfRoadsWoodsAndEachOther() {
		STRtree roads = new STRtree();
		world.roads().forEach((r) -> roads.insert(r.geometry().getEnvelopeInternal(), r));
		STRtree buildings = new STRtree();
		world.buildings().forEach((b) -> buildings.insert(b.geometry().getEnvelopeInternal(), b));
		assertThat(world.buildings()).hasSizeGreaterThan(500);
		for (Building building : world.buildings()) {
			Geometry outline = building.geometry();
			assertThat(outline.isValid()).isTrue();
			for (int i = 0; i < outline.getNumGeometries(); i++) {
				Polygon box = (Polygon) MinimumAreaRectangle.getMinimumRectangle(outline.getGeometryN(i));
				Coordinate[] corners = box.getCoordinates();
				assertThat(corners[0].distance(corners[1])).as(building.id()).isBetween(7.9, 25.1);
				assertThat(corners[1].distance(corners[2])).as(building.id()).isBetween(7.9, 25.1);
			}
			Envelope near = new Envelope(outline.getEnvelopeInternal());
			near.expandBy(10);
			for (Object item : roads.query(near)) {
				Road road = (Road) item;
				assertThat(outline.distance(road.geometry())).isGreaterThan(road.widthMetres() / 2);
			}
			for (Object item : buildings.query(near)) {
				Building other = (Building) item;
				assertThat(other == building || !other.geometry().intersects(outline)).isTrue();
			}
			assertThat(world.woods()).noneMatch((w) -> w.geometry().intersects(outline));
		}
	}

	@Test
	void woodsHideStretchesOfSeveralRoads() {
		List<HiddenStretch> hidden = world.hiddenStretches();
		assertThat(hidden.stream().map(HiddenStretch::roadId).distinct().count()).isGreaterThanOrEqualTo(4);
		Geometry cover = LocalFrame.METRES.buildGeometry(world.woods().stream().map((w) -> w.geometry()).toList())
			.union()
			.buffer(HiddenStretchFinder.STEP + 0.1);
		for (HiddenStretch stretch : hidden) {
			assertThat(cover.contains(stretch.geometry())).as(stretch.roadId()).isTrue();
			assertThat(stretch.toMetre() - stretch.fromMetre()).isCloseTo(stretch.geometry().getLength(),
					org.assertj.core.data.Offset.offset(0.01));
		}
	}

	@Test
	void fieldsStayClearOfRoadsAndEachOther() {
		assertThat(world.fields()).hasSizeGreaterThan(100);
		STRtree fields = new STRtree();
		world.fields().forEach((f) -> fields.insert(f.geometry().getEnvelopeInternal(), f));
		for (DemoWorld.Field field : world.fields()) {
			assertThat(field.geometry().isValid()).isTrue();
			assertThat(world.roads()).noneMatch((r) -> r.geometry().intersects(field.geometry()));
			for (Object item : fields.query(field.geometry().getEnvelopeInternal())) {
				DemoWorld.Field other = (DemoWorld.Field) item;
				assertThat(other == field || !other.geometry().intersects(field.geometry())).isTrue();
			}
		}
	}

	@Test
	void theLocalFrameAgreesWithGeodesicsOnTheIsland() {
		LocalFrame frame = new LocalFrame(-31.7, 40.9);
		double[][] pairs = { { -6000, -4500, 6000, 4500 }, { -6000, 4500, 6000, 4500 }, { 0, -4500, 0, 4500 },
				{ 3000, 2000, 3010, 2000 } };
		for (double[] p : pairs) {
			double local = Math.hypot(p[2] - p[0], p[3] - p[1]);
			double geodesic = Geodesic.WGS84.Inverse(frame.lat(p[1]), frame.lon(p[0]), frame.lat(p[3]),
					frame.lon(p[2])).s12;
			assertThat(Math.abs(local - geodesic) / geodesic).isLessThan(0.0007);
		}
	}

	@Test
	void anotherSeedGrowsAnotherIsland() {
		DemoWorld other = DemoWorldGenerator.generate(SEED + 1);
		assertThat(other.coastline().equalsExact(world.coastline())).isFalse();
		assertThat(other.roads().get(0).geometry().equalsExact(world.roads().get(0).geometry())).isFalse();
	}

}
