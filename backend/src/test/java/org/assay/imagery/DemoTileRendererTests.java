package org.assay.imagery;

import java.awt.Color;
import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.HashSet;
import java.util.Map;
import java.util.Set;

import javax.imageio.ImageIO;

import org.assay.demo.DemoDraft;
import org.assay.demo.DemoWorld;
import org.assay.demo.DemoWorld.HiddenStretch;
import org.assay.demo.DemoWorld.RoadClass;
import org.assay.demo.FaultClass;
import org.assay.demo.PlantedFault;
import org.assay.geo.FeatureKind;
import org.assay.geo.WebMercatorQuad;
import org.assay.geo.WebMercatorQuad.Tile;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Point;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Tiles drawn from the demo's true world: their size, their determinism, and that a
 * person sees roads where the world has them, sea off the island, canopy over hidden
 * stretches and plain ground under false detections.
 */
class DemoTileRendererTests {

	private static final GeometryFactory WGS84 = new GeometryFactory();

	private final DemoWorld world = DemoWorldHolder.get();

	@TempDir
	Path cache;

	@Test
	void aTileNearTheIslandCentreIsAVariedPngWithRoadGreyOnAMainRoad() throws IOException {
		Coordinate vertex = mainRoadVertexNearestTheCentre();
		Tile tile = WebMercatorQuad.tileAt(vertex.x, vertex.y, 16);
		BufferedImage image = decode(imagery().tile(16, tile.x(), tile.y()).orElseThrow());
		assertThat(image.getWidth()).isEqualTo(256);
		assertThat(image.getHeight()).isEqualTo(256);
		assertThat(distinctColours(image)).isGreaterThan(500);
		assertThat(classify(pixelAt(image, tile, vertex))).isEqualTo(Look.ROAD_GREY);
	}

	@Test
	void aTileOffTheIslandIsSea() throws IOException {
		Envelope island = this.world.bounds();
		Tile tile = WebMercatorQuad.tileAt(island.getMaxX() + 0.05, island.centre().y, 14);
		BufferedImage image = decode(imagery().tile(14, tile.x(), tile.y()).orElseThrow());
		for (int y = 0; y < 256; y += 5) {
			for (int x = 0; x < 256; x += 5) {
				assertThat(classify(new Color(image.getRGB(x, y)))).isEqualTo(Look.SEA);
			}
		}
	}

	@Test
	void roadsUnderTreeCoverAreHiddenByCanopy() {
		DemoTileRenderer renderer = new DemoTileRenderer(this.world);
		int checked = 0;
		for (HiddenStretch stretch : this.world.hiddenStretches()) {
			Point middle = stretch.geometry().getInteriorPoint();
			Coordinate at = middle.getCoordinate();
			if (stretch.toMetre() - stretch.fromMetre() < 40 || !insideWoodsBy(middle, 15)) {
				continue;
			}
			Tile tile = WebMercatorQuad.tileAt(at.x, at.y, 18);
			assertThat(classify(pixelAt(renderer.render(tile), tile, at))).as(stretch.roadId()).isEqualTo(Look.CANOPY);
			checked++;
		}
		assertThat(checked).isGreaterThan(0);
	}

	@Test
	void falselyDetectedRoadsHaveNoRoadBeneathThem() {
		DemoTileRenderer renderer = new DemoTileRenderer(this.world);
		Map<String, PlantedFault> truth = DemoWorldHolder.scenario().truth();
		int checked = 0;
		for (DemoDraft draft : DemoWorldHolder.scenario().drafts()) {
			PlantedFault fault = truth.get(draft.id());
			if (fault.faultClass() != FaultClass.FALSE_DETECTION || fault.kind() != FeatureKind.ROAD) {
				continue;
			}
			Coordinate at = draft.geometry().getInteriorPoint().getCoordinate();
			Tile tile = WebMercatorQuad.tileAt(at.x, at.y, 18);
			assertThat(classify(pixelAt(renderer.render(tile), tile, at))).as(draft.id()).isNotEqualTo(Look.ROAD_GREY);
			checked++;
		}
		assertThat(checked).isGreaterThan(0);
	}

	@Test
	void theSameTileIsDrawnTheSameEachTime() {
		Coordinate vertex = mainRoadVertexNearestTheCentre();
		Tile tile = WebMercatorQuad.tileAt(vertex.x, vertex.y, 17);
		DemoTileRenderer renderer = new DemoTileRenderer(this.world);
		assertThat(DemoImagery.png(renderer.render(tile))).isEqualTo(DemoImagery.png(renderer.render(tile)));
	}

	@Test
	void onlyZoomTwelveToNineteenWithinTheMatrixIsServed() {
		DemoImagery imagery = imagery();
		Tile centre = WebMercatorQuad.tileAt(-31.7, 40.9, 12);
		assertThat(imagery.tile(12, centre.x(), centre.y())).isPresent();
		assertThat(imagery.tile(11, centre.x() / 2, centre.y() / 2)).isEmpty();
		assertThat(imagery.tile(20, 0, 0)).isEmpty();
		assertThat(imagery.tile(12, 4096, 0)).isEmpty();
		assertThat(imagery.tile(12, 0, -1)).isEmpty();
		assertThat(imagery.tile(19, (1 << 19) - 1, (1 << 19) - 1)).isPresent();
	}

	private DemoImagery imagery() {
		return new DemoImagery(() -> this.world, this.cache);
	}

	private Coordinate mainRoadVertexNearestTheCentre() {
		Coordinate centre = new Coordinate(-31.7, 40.9);
		return this.world.roads()
			.stream()
			.filter((road) -> road.roadClass() == RoadClass.MAIN)
			.flatMap((road) -> java.util.Arrays.stream(road.geometry().getCoordinates()))
			.filter((c) -> !insideWoodsBy(WGS84.createPoint(c), -30))
			.min(Comparator.comparingDouble((c) -> c.distance(centre)))
			.orElseThrow();
	}

	/**
	 * Whether a point lies in woods at least {@code metres} from their edge; a negative
	 * distance asks whether it lies nowhere within that distance of any woods.
	 */
	private boolean insideWoodsBy(Point point, double metres) {
		double degrees = metres / 111_000.0 / Math.cos(Math.toRadians(40.9));
		for (DemoWorld.Woods woods : this.world.woods()) {
			Geometry area = woods.geometry().buffer(-degrees);
			if (metres >= 0 && area.contains(point)) {
				return true;
			}
			if (metres < 0 && area.intersects(point)) {
				return true;
			}
		}
		return false;
	}

	private static Color pixelAt(BufferedImage image, Tile tile, Coordinate at) {
		TileFrame frame = new TileFrame(tile);
		return new Color(image.getRGB((int) frame.px(at.x), (int) frame.py(at.y)));
	}

	private static int distinctColours(BufferedImage image) {
		Set<Integer> colours = new HashSet<>();
		for (int y = 0; y < 256; y++) {
			for (int x = 0; x < 256; x++) {
				colours.add(image.getRGB(x, y));
			}
		}
		return colours.size();
	}

	private static BufferedImage decode(byte[] png) throws IOException {
		return ImageIO.read(new ByteArrayInputStream(png));
	}

	/** What a pixel looks like to a person, by its hue and brightness. */
	enum Look {

		ROAD_GREY, SEA, CANOPY, OTHER

	}

	static Look classify(Color colour) {
		int r = colour.getRed();
		int g = colour.getGreen();
		int b = colour.getBlue();
		int spread = Math.max(r, Math.max(g, b)) - Math.min(r, Math.min(g, b));
		int mean = (r + g + b) / 3;
		if (spread <= 14 && mean >= 90 && mean <= 200) {
			return Look.ROAD_GREY;
		}
		if (b > r + 25 && b > g + 5) {
			return Look.SEA;
		}
		if (g > r + 12 && g > b + 12 && mean < 75) {
			return Look.CANOPY;
		}
		return Look.OTHER;
	}

}
