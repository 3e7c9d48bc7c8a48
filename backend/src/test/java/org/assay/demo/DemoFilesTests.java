package org.assay.demo;

import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;
import org.locationtech.jts.algorithm.Orientation;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Polygon;
import tools.jackson.databind.JsonNode;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The demo's GeoJSON files, parsed back: valid RFC 7946 geometries on the island, and no
 * word of the truth in what validators see.
 */
class DemoFilesTests {

	private final DemoFixture demo = DemoFixture.get();

	@Test
	void everyWrittenGeometryIsValidAndOfItsKindsType() {
		Map<String, Integer> types = new HashMap<>();
		for (JsonNode feature : this.demo.drafts) {
			String id = feature.get("id").stringValue();
			Geometry geometry = GeoJsonTestGeometries.read(feature.get("geometry"));
			types.merge(geometry.getGeometryType(), 1, Integer::sum);
			assertThat(geometry.isValid()).as(id).isTrue();
			if (feature.get("properties").get("kind").stringValue().equals("road")) {
				assertThat(geometry.getGeometryType()).isIn("LineString", "MultiLineString");
				for (int i = 0; i < geometry.getNumGeometries(); i++) {
					assertThat(((LineString) geometry.getGeometryN(i)).getLength()).as(id).isPositive();
				}
			}
			else {
				assertThat(geometry.getGeometryType()).isIn("Polygon", "MultiPolygon");
				assertThat(shellsWindCounterClockwise(geometry)).as(id).isTrue();
			}
		}
		assertThat(types).containsKeys("LineString", "MultiLineString", "Polygon", "MultiPolygon");
		assertThat(this.demo.referenceGeometries.values()).allMatch(Geometry::isValid);
	}

	@Test
	void everyCoordinateLiesOnTheIslandWithSevenDecimals() {
		Envelope island = this.demo.scenario.world().bounds();
		assertThat(island.getMinX()).isGreaterThan(-31.78);
		assertThat(island.getMaxX()).isLessThan(-31.62);
		assertThat(island.getMinY()).isGreaterThan(40.85);
		assertThat(island.getMaxY()).isLessThan(40.95);
		List<Geometry> written = new ArrayList<>(this.demo.referenceGeometries.values());
		this.demo.drafts.forEach((f) -> written.add(GeoJsonTestGeometries.read(f.get("geometry"))));
		int coordinates = 0;
		for (Geometry geometry : written) {
			for (Coordinate c : geometry.getCoordinates()) {
				assertThat(island.contains(c)).as(c.toString()).isTrue();
				coordinates++;
			}
		}
		Matcher pair = Pattern.compile("\\[(-?\\d+\\.\\d+),(-?\\d+\\.\\d+)\\]")
			.matcher(text(this.demo.draftBytes) + text(this.demo.referenceBytes));
		int pairs = 0;
		while (pair.find()) {
			assertThat(pair.group(1)).matches("-31\\.\\d{7}");
			assertThat(pair.group(2)).matches("40\\.\\d{7}");
			pairs++;
		}
		assertThat(pairs).isEqualTo(coordinates);
	}

	@Test
	void thePropertiesRevealNoTruth() {
		Set<String> allowed = Set.of("kind", "confidence", "class", "model_tile", "score_raw");
		for (JsonNode feature : this.demo.drafts) {
			assertThat(feature.propertyNames()).containsExactlyInAnyOrder("type", "id", "geometry", "properties");
			assertThat(feature.get("id").stringValue()).matches("d-\\d{5}");
			JsonNode properties = feature.get("properties");
			assertThat(allowed).containsAll(properties.propertyNames());
			assertThat(properties.get("model_tile").stringValue()).matches("17/\\d+/\\d+");
			if (properties.has("class")) {
				assertThat(properties.get("class").stringValue()).isIn("main", "residential", "track", "house", "barn");
			}
		}
		String text = text(this.demo.draftBytes).toLowerCase(Locale.ROOT);
		for (String word : List.of("good", "shift", "false", "fragment", "partial", "already", "detection", "truth",
				"road-", "bldg-", "ref-", "woods", "field")) {
			assertThat(text).doesNotContain(word);
		}
	}

	@Test
	void theReferenceCarriesItsSourceIds() {
		assertThat(this.demo.referenceGeometries.keySet()).allMatch((id) -> id.matches("ref-[rb]-\\d{4}"));
		assertThat(this.demo.scenario.reference()).extracting(DemoReferenceFeature::id)
			.containsExactlyInAnyOrderElementsOf(this.demo.referenceGeometries.keySet());
	}

	private static String text(byte[] bytes) {
		return new String(bytes, StandardCharsets.UTF_8);
	}

	private static boolean shellsWindCounterClockwise(Geometry geometry) {
		for (int i = 0; i < geometry.getNumGeometries(); i++) {
			Polygon polygon = (Polygon) geometry.getGeometryN(i);
			if (!Orientation.isCCW(polygon.getExteriorRing().getCoordinateSequence())) {
				return false;
			}
		}
		return true;
	}

}
