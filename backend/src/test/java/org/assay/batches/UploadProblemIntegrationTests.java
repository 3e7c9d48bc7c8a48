package org.assay.batches;

import java.nio.charset.StandardCharsets;
import java.util.Map;
import java.util.UUID;
import java.util.stream.Stream;

import org.assay.accounts.AccountService;
import org.assay.accounts.Role;
import org.assay.support.ApiClient;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import tools.jackson.databind.JsonNode;

import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.web.server.LocalServerPort;
import org.springframework.jdbc.core.JdbcTemplate;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Bad uploads through the HTTP API: each gets an RFC 9457 problem that names the feature
 * (index and id) and the fault, and nothing of the batch is stored. The rules are those
 * of RFC 7946 (GeoJSON) unless a case says otherwise.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT, properties = {
		"spring.servlet.multipart.max-file-size=200KB", "spring.servlet.multipart.max-request-size=300KB" })
class UploadProblemIntegrationTests {

	private static final String GOOD_ROAD = "{\"type\":\"Feature\",\"id\":\"ok-0\",\"properties\":{\"kind\":\"road\","
			+ "\"confidence\":0.5},\"geometry\":{\"type\":\"LineString\",\"coordinates\":[[10,50],[10.001,50.001]]}}";

	@LocalServerPort
	int port;

	@Autowired
	AccountService accounts;

	@Autowired
	JdbcTemplate jdbc;

	ApiClient lead;

	@BeforeEach
	void signIn() {
		String name = "lead-" + UUID.randomUUID().toString().substring(0, 8);
		this.accounts.create(name, "Lead", "pass-" + name, Role.LEAD);
		this.lead = ApiClient.signIn(this.port, name, "pass-" + name);
	}

	/** A collection whose second feature (index 1, id "bad") has the given parts. */
	private static String second(String properties, String geometry) {
		return "{\"type\":\"FeatureCollection\",\"features\":[" + GOOD_ROAD + ",{\"type\":\"Feature\",\"id\":\"bad\","
				+ "\"properties\":" + properties + ",\"geometry\":" + geometry + "}]}";
	}

	private static String road(String coordinates) {
		return second("{\"kind\":\"road\",\"confidence\":0.5}",
				"{\"type\":\"LineString\",\"coordinates\":" + coordinates + "}");
	}

	private static String building(String rings) {
		return second("{\"kind\":\"building\",\"confidence\":0.5}",
				"{\"type\":\"Polygon\",\"coordinates\":" + rings + "}");
	}

	static Stream<Arguments> badInputs() {
		String line = "{\"type\":\"LineString\",\"coordinates\":[[10,50],[10.001,50]]}";
		return Stream.of(
				// not GeoJSON at all
				Arguments.of("plain text", "this is not json", "not-geojson", -1, null),
				Arguments.of("a JSON array", "[1,2,3]", "not-geojson", -1, null),
				Arguments.of("a single Feature, not a collection", GOOD_ROAD, "not-geojson", -1, null),
				Arguments.of("features not an array", "{\"type\":\"FeatureCollection\",\"features\":{}}", "not-geojson",
						-1, null),
				Arguments.of("truncated document",
						"{\"type\":\"FeatureCollection\",\"features\":[" + GOOD_ROAD + ",{\"type\":\"Feat",
						"not-geojson", 1, null),
				Arguments.of("a member of type Point in features",
						"{\"type\":\"FeatureCollection\",\"features\":[" + GOOD_ROAD
								+ ",{\"type\":\"Point\",\"coordinates\":[1,2]}]}",
						"not-geojson", 1, null),
				Arguments.of("empty collection", "{\"type\":\"FeatureCollection\",\"features\":[]}", "empty-collection",
						-1, null),
				// RFC 7946 section 4: no crs member
				Arguments.of("crs member on the collection",
						"{\"type\":\"FeatureCollection\",\"crs\":{\"type\":\"name\"},\"features\":[" + GOOD_ROAD + "]}",
						"crs-member", -1, null),
				Arguments.of("crs member on a feature",
						"{\"type\":\"FeatureCollection\",\"features\":[" + GOOD_ROAD
								+ ",{\"type\":\"Feature\",\"id\":\"bad\",\"crs\":{},\"properties\":{\"kind\":\"road\","
								+ "\"confidence\":0.5},\"geometry\":" + line + "}]}",
						"crs-member", 1, "bad"),
				// geometry
				Arguments.of("null geometry", second("{\"kind\":\"road\",\"confidence\":0.5}", "null"),
						"missing-geometry", 1, "bad"),
				Arguments.of("polygon for a road",
						second("{\"kind\":\"road\",\"confidence\":0.5}",
								"{\"type\":\"Polygon\",\"coordinates\":[[[0,0],[1,0],[1,1],[0,0]]]}"),
						"wrong-geometry-type", 1, "bad"),
				Arguments.of("line for a building", second("{\"kind\":\"building\",\"confidence\":0.5}", line),
						"wrong-geometry-type", 1, "bad"),
				Arguments.of("point for a road",
						second("{\"kind\":\"road\",\"confidence\":0.5}", "{\"type\":\"Point\",\"coordinates\":[1,2]}"),
						"wrong-geometry-type", 1, "bad"),
				Arguments.of("geometry collection",
						second("{\"kind\":\"road\",\"confidence\":0.5}",
								"{\"type\":\"GeometryCollection\",\"geometries\":[]}"),
						"wrong-geometry-type", 1, "bad"),
				Arguments.of("unknown kind", second("{\"kind\":\"river\",\"confidence\":0.5}", line), "unknown-kind", 1,
						"bad"),
				Arguments.of("missing kind", second("{\"confidence\":0.5}", line), "unknown-kind", 1, "bad"),
				// coordinates: RFC 7946 section 3.1.1, WGS84 longitude and latitude
				Arguments.of("longitude above 180", road("[[10,50],[180.5,50]]"), "coordinate-out-of-range", 1, "bad"),
				Arguments.of("latitude below -90", road("[[10,50],[10,-90.5]]"), "coordinate-out-of-range", 1, "bad"),
				Arguments.of("NaN coordinate", road("[[10,50],[NaN,50]]"), "coordinate-not-finite", 1, "bad"),
				Arguments.of("overflowing coordinate", road("[[10,50],[1e999,50]]"), "coordinate-not-finite", 1, "bad"),
				Arguments.of("position with one number", road("[[10,50],[10]]"), "bad-position", 1, "bad"),
				Arguments.of("position with a string", road("[[10,50],[\"10\",50]]"), "bad-position", 1, "bad"),
				// RFC 7946 section 3.1.4: a LineString has two or more positions
				Arguments.of("line with one position", road("[[10,50]]"), "too-few-points", 1, "bad"),
				Arguments.of("line with two equal positions", road("[[10,50],[10,50]]"), "too-few-points", 1, "bad"),
				// RFC 7946 section 3.1.6: rings are closed with four or more positions
				Arguments.of("ring with three positions", building("[[[0,0],[1,0],[0,0]]]"), "too-few-points", 1,
						"bad"),
				Arguments.of("unclosed ring", building("[[[0,0],[1,0],[1,1],[0,1]]]"), "unclosed-ring", 1, "bad"),
				// OGC Simple Features: a polygon's ring must not cross itself
				Arguments.of("self-crossing ring (bow tie)", building("[[[0,0],[1,1],[1,0],[0,1],[0,0]]]"),
						"self-intersecting-ring", 1, "bad"),
				// Assay's own rules: confidence is a probability
				Arguments.of("confidence above 1", second("{\"kind\":\"road\",\"confidence\":1.5}", line),
						"bad-confidence", 1, "bad"),
				Arguments.of("negative confidence", second("{\"kind\":\"road\",\"confidence\":-0.1}", line),
						"bad-confidence", 1, "bad"),
				Arguments.of("confidence as text", second("{\"kind\":\"road\",\"confidence\":\"high\"}", line),
						"bad-confidence", 1, "bad"),
				Arguments.of("missing confidence", second("{\"kind\":\"road\"}", line), "bad-confidence", 1, "bad"),
				Arguments.of("duplicate feature id",
						"{\"type\":\"FeatureCollection\",\"features\":[" + GOOD_ROAD + "," + GOOD_ROAD + "]}",
						"duplicate-id", 1, "ok-0"));
	}

	@ParameterizedTest(name = "{0}")
	@MethodSource("badInputs")
	void aBadUploadGetsAProblemNamingTheFeatureAndStoresNothing(String name, String body, String fault, int index,
			String id) {
		int batches = count("batch");
		int drafts = count("draft");
		ApiClient.Response response = this.lead.upload(Map.of("name", "bad: " + name),
				Map.of("drafts", body.getBytes(StandardCharsets.UTF_8)), "wait=true");
		assertThat(response.status()).as(response.text()).isEqualTo(422);
		assertThat(response.header("Content-Type")).startsWith("application/problem+json");
		JsonNode problem = response.json();
		assertThat(problem.get("fault").asString()).isEqualTo(fault);
		assertThat(problem.get("featureIndex").asInt()).isEqualTo(index);
		if (id != null) {
			assertThat(problem.get("featureId").asString()).isEqualTo(id);
			assertThat(problem.get("detail").asString()).contains(id);
		}
		if (index >= 0) {
			assertThat(problem.get("detail").asString()).contains("Feature " + index);
		}
		assertThat(problem.get("detail").asString()).endsWith("Nothing of the batch was stored.");
		assertThat(problem.get("stored").asBoolean()).isFalse();
		assertThat(count("batch")).isEqualTo(batches);
		assertThat(count("draft")).isEqualTo(drafts);
	}

	@Test
	void aBadReferenceLayerIsReportedAsSuch() {
		String reference = "{\"type\":\"FeatureCollection\",\"features\":[{\"type\":\"Feature\",\"id\":\"ref-9\","
				+ "\"properties\":{\"kind\":\"road\"},\"geometry\":{\"type\":\"LineString\",\"coordinates\":"
				+ "[[10,50],[10,95]]}}]}";
		ApiClient.Response response = this.lead.upload(Map.of("name", "bad reference"),
				Map.of("drafts",
						("{\"type\":\"FeatureCollection\",\"features\":[" + GOOD_ROAD + "]}")
							.getBytes(StandardCharsets.UTF_8),
						"reference", reference.getBytes(StandardCharsets.UTF_8)),
				"wait=true");
		assertThat(response.status()).isEqualTo(422);
		assertThat(response.json().get("file").asString()).isEqualTo("reference");
		assertThat(response.json().get("featureId").asString()).isEqualTo("ref-9");
		assertThat(response.json().get("fault").asString()).isEqualTo("coordinate-out-of-range");
	}

	@Test
	void aFileOverTheSizeLimitIsRefusedWithItsOwnFault() {
		StringBuilder big = new StringBuilder("{\"type\":\"FeatureCollection\",\"features\":[");
		for (int i = 0; i < 3000; i++) {
			big.append((i > 0) ? "," : "").append(GOOD_ROAD.replace("ok-0", "ok-" + i));
		}
		ApiClient.Response response = this.lead.upload(Map.of("name", "too big"),
				Map.of("drafts", big.append("]}").toString().getBytes(StandardCharsets.UTF_8)), "wait=true");
		assertThat(response.status()).isEqualTo(413);
		assertThat(response.json().get("fault").asString()).isEqualTo("file-too-large");
	}

	@Test
	void badSettingsAreRefusedBeforeAnythingIsParsed() {
		ApiClient.Response response = this.lead.upload(Map.of("name", "x", "imageryUrl", "ftp://tiles/{z}/{x}"),
				Map.of("drafts", "{}".getBytes(StandardCharsets.UTF_8)), "wait=true");
		assertThat(response.status()).isEqualTo(400);
		assertThat(response.json().get("detail").asString()).contains("imageryUrl");
	}

	private int count(String table) {
		return this.jdbc.queryForObject("select count(*) from " + table, Integer.class);
	}

}
