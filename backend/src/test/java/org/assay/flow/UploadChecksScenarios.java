package org.assay.flow;

import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.UUID;

import org.assay.accounts.AccountService;
import org.assay.accounts.Role;
import org.assay.support.ApiClient;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import tools.jackson.databind.JsonNode;

import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.web.server.LocalServerPort;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * The automated checks as part of an upload, through the HTTP API: flags stored with the
 * measured values, the risk order of the queue, per-batch settings, the flag summary and
 * the export. Run by subclasses on each database.
 *
 * <p>
 * The fixture is three roads near the equator, one cell each, and one reference road
 * along latitude 0.001 from longitude 0 to 0.01:
 * <ul>
 * <li>{@code dup}: the west part of the reference road (to longitude 0.004) shifted
 * 0.000018° north (2 m), confidence 0.9: a full duplicate;</li>
 * <li>{@code short}: a road at longitude 0.005 from latitude 0.004 south to 0.001045,
 * confidence 0.8: its end stops 0.000045° of latitude short of the reference road;</li>
 * <li>{@code good}: a road at longitude 0.008 from a vertex of the reference road north
 * to latitude 0.006, confidence 0.95: joined, nothing to flag.</li>
 * </ul>
 */
abstract class UploadChecksScenarios {

	/**
	 * Metres in a degree of latitude at the equator: the meridional radius of curvature
	 * there, a(1 − e²) = 6,335,439 m for WGS84 (NIMA TR8350.2, table 3.1 gives a and e²),
	 * times π/180.
	 */
	private static final double METRES_PER_DEGREE_LATITUDE = 6_335_439.327 * Math.PI / 180;

	private static final String REFERENCE = collection(
			road("mapped-1", "road", -1, new double[][] { { 0, 0.001 }, { 0.008, 0.001 }, { 0.01, 0.001 } }));

	private static final String DRAFTS = collection(
			road("dup", "road", 0.9, new double[][] { { 0, 0.001018 }, { 0.002, 0.001018 }, { 0.004, 0.001018 } }),
			road("short", "road", 0.8, new double[][] { { 0.005, 0.004 }, { 0.005, 0.001045 } }),
			road("good", "road", 0.95, new double[][] { { 0.008, 0.001 }, { 0.008, 0.006 } }));

	@LocalServerPort
	int port;

	@Autowired
	AccountService accounts;

	ApiClient lead;

	ApiClient validator;

	@BeforeEach
	void signIn() {
		String suffix = UUID.randomUUID().toString().substring(0, 8);
		this.accounts.create("lead-" + suffix, "Lead " + suffix, "lead-pass-" + suffix, Role.LEAD);
		this.accounts.create("val-" + suffix, "Validator " + suffix, "val-pass-" + suffix, Role.VALIDATOR);
		this.lead = ApiClient.signIn(this.port, "lead-" + suffix, "lead-pass-" + suffix);
		this.validator = ApiClient.signIn(this.port, "val-" + suffix, "val-pass-" + suffix);
	}

	@Test
	void uploadedDraftsCarryTheirFlagsWithMeasuredValues() {
		long batchId = upload(Map.of());
		Map<String, JsonNode> drafts = draftsBySourceId(batchId);

		JsonNode dup = drafts.get("dup").get("properties");
		JsonNode mapped = flag(dup, "mapped-already");
		assertThat(mapped).as(dup.toString()).isNotNull();
		assertThat(mapped.get("label").asString()).isEqualTo("Already on the map");
		assertThat(mapped.get("otherId").asString()).isEqualTo("mapped-1");
		assertThat(mapped.get("otherLayer").asString()).isEqualTo("reference");
		assertThat(mapped.get("values").get("share").asDouble()).isEqualTo(1.0);
		// every vertex of the draft is 0.000018° of latitude from the reference road
		assertThat(mapped.get("values").get("hausdorffMetres").asDouble())
			.isCloseTo(0.000018 * METRES_PER_DEGREE_LATITUDE, within(0.01));
		// risk = 1 - c * (1 - w) for each distinct kind (RiskScore), w = 0.9 for a
		// duplicate
		assertThat(dup.get("risk").asDouble()).isGreaterThanOrEqualTo(0.91 - 0.001);

		JsonNode stopsShort = drafts.get("short").get("properties");
		JsonNode nearMiss = flag(stopsShort, "near-miss");
		assertThat(nearMiss).as(stopsShort.toString()).isNotNull();
		assertThat(nearMiss.get("values").get("gapMetres").asDouble()).isCloseTo(0.000045 * METRES_PER_DEGREE_LATITUDE,
				within(0.01));
		assertThat(nearMiss.get("point").get(0).asDouble()).isCloseTo(0.005, within(1e-6));
		assertThat(nearMiss.get("point").get(1).asDouble()).isCloseTo(0.001, within(1e-6));
		assertThat(stopsShort.get("risk").asDouble()).isCloseTo(1 - 0.8 * 0.7, within(0.001));

		JsonNode good = drafts.get("good").get("properties");
		assertThat(good.get("flags")).as(good.toString()).isEmpty();
		assertThat(good.get("risk").asDouble()).isCloseTo(0.05, within(0.001));
	}

	@Test
	void claimNextHandsOutTheRiskiestCellFirstUnlessTheLeadChoosesAnotherOrder() {
		long batchId = upload(Map.of());
		assertThat(claimOrder(batchId, this.validator)).containsExactly("dup", "short", "good");

		long sweepId = upload(Map.of());
		ApiClient.Response sweep = this.lead.put("/api/batches/" + sweepId + "/queue-order", Map.of("order", "sweep"));
		assertThat(sweep.status()).as(sweep.text()).isEqualTo(200);
		assertThat(sweep.json().get("queueOrder").asString()).isEqualTo("sweep");
		// a sweep starts in the north, where only the cell of good reaches
		// (CellRankingTests
		// has the whole rule)
		assertThat(claimOrder(sweepId, this.validator)).hasSize(3).startsWith("good");

		assertThat(this.validator.put("/api/batches/" + sweepId + "/queue-order", Map.of("order", "risk")).status())
			.as("only the batch's lead changes the order")
			.isEqualTo(403);
		ApiClient.Response unknown = this.lead.put("/api/batches/" + sweepId + "/queue-order",
				Map.of("order", "alphabetical"));
		assertThat(unknown.status()).isEqualTo(400);
		assertThat(unknown.text()).contains("risk").contains("sweep");
	}

	@Test
	void aLeadSetsThresholdsAndSwitchesChecksOffPerBatch() {
		long batchId = upload(
				Map.of("checks", "{\"nearMiss\": {\"enabled\": false}, \"mapped\": {\"bufferMetres\": 6}}"));
		Map<String, JsonNode> drafts = draftsBySourceId(batchId);
		assertThat(flag(drafts.get("short").get("properties"), "near-miss")).isNull();
		assertThat(flag(drafts.get("dup").get("properties"), "mapped-already")).isNotNull();
		JsonNode summary = this.lead.get("/api/batches/" + batchId + "/flags").json();
		assertThat(summary.get("settings").get("nearMiss").get("enabled").asBoolean()).isFalse();
		assertThat(summary.get("settings").get("mapped").get("bufferMetres").asDouble()).isEqualTo(6.0);
		assertThat(summary.get("settings").get("mapped").get("fullShare").asDouble()).as("default kept").isEqualTo(0.9);

		ApiClient.Response misspelt = this.lead.upload(fields(Map.of("checks", "{\"nearMiss\": {\"maxGap\": 3}}")),
				files(), "wait=true");
		assertThat(misspelt.status()).isEqualTo(400);
		assertThat(misspelt.text()).contains("checks.nearMiss.maxGap is not a setting").contains("maxGapMetres");
		ApiClient.Response inverted = this.lead.upload(
				fields(Map.of("checks", "{\"nearMiss\": {\"minGapMetres\": 12, \"maxGapMetres\": 3}}")), files(),
				"wait=true");
		assertThat(inverted.status()).isEqualTo(400);
		assertThat(inverted.text()).contains("maxGapMetres must be more than minGapMetres");
	}

	@Test
	void theFlagSummaryCountsDraftsPerFlagAndShowsTheFormula() {
		long batchId = upload(Map.of());
		JsonNode summary = this.validator.get("/api/batches/" + batchId + "/flags").json();
		Map<String, Integer> counts = new HashMap<>();
		summary.get("counts").forEach((row) -> counts.put(row.get("code").asString(), row.get("drafts").asInt()));
		assertThat(counts.get("mapped-already")).isEqualTo(1);
		assertThat(counts.get("near-miss")).isGreaterThanOrEqualTo(1);
		assertThat(counts.get("spike")).isZero();
		assertThat(summary.get("flagged").asInt()).isEqualTo(2);
		assertThat(summary.get("riskFormula").asString()).contains("1 - c");
		JsonNode kinds = this.validator.get("/api/checks").json();
		assertThat(kinds.get("flags")).hasSize(13);
		assertThat(kinds.get("defaults").get("nearMiss").get("maxGapMetres").asDouble()).isEqualTo(10.0);
	}

	@Test
	void theExportCarriesTheFlags() {
		long batchId = upload(Map.of());
		for (ApiClient.Response claim = this.validator.post("/api/batches/" + batchId + "/claims/next", null); claim
			.status() == 200; claim = this.validator.post("/api/batches/" + batchId + "/claims/next", null)) {
			for (JsonNode draft : this.validator.get("/api/cells/" + claim.json().get("id").asLong() + "/drafts")
				.json()
				.get("features")) {
				ApiClient.Response given = this.validator.put("/api/verdicts/" + UUID.randomUUID(),
						Map.of("draftId", draft.get("id").asLong(), "verdict", "ACCEPT"));
				assertThat(given.status()).as(given.text()).isEqualTo(201);
			}
		}
		JsonNode export = this.lead.get("/api/batches/" + batchId + "/export.geojson").json();
		Map<String, JsonNode> bySource = new HashMap<>();
		export.get("features").forEach((f) -> bySource.put(f.get("properties").get("source_id").asString(), f));
		assertThat(bySource.get("dup").get("properties").get("flags").asString()).contains("mapped-already");
		assertThat(bySource.get("dup").get("properties").get("flag_details").get(0).get("code").asString())
			.isEqualTo("mapped-already");
		assertThat(bySource.get("good").get("properties").get("flags").asString()).isEmpty();
	}

	private List<String> claimOrder(long batchId, ApiClient client) {
		List<String> order = new ArrayList<>();
		for (ApiClient.Response claim = client.post("/api/batches/" + batchId + "/claims/next", null); claim
			.status() == 200; claim = client.post("/api/batches/" + batchId + "/claims/next", null)) {
			long cellId = claim.json().get("id").asLong();
			JsonNode features = client.get("/api/cells/" + cellId + "/drafts").json().get("features");
			order.add(features.get(0).get("properties").get("sourceId").asString());
			for (JsonNode draft : features) {
				ApiClient.Response given = client.put("/api/verdicts/" + UUID.randomUUID(),
						Map.of("draftId", draft.get("id").asLong(), "verdict", "ACCEPT"));
				assertThat(given.status()).as(given.text()).isEqualTo(201);
			}
			if (order.size() > 10) {
				break;
			}
		}
		return order;
	}

	long upload(Map<String, String> extra) {
		ApiClient.Response response = this.lead.upload(fields(extra), files(), "wait=true");
		assertThat(response.status()).as(response.text()).isEqualTo(201);
		return response.json().get("batchId").asLong();
	}

	private static Map<String, String> fields(Map<String, String> extra) {
		Map<String, String> fields = new HashMap<>(
				Map.of("name", "checks test", "maxDraftsPerCell", "1", "secondReviewShare", "0"));
		fields.putAll(extra);
		return fields;
	}

	private static Map<String, byte[]> files() {
		return Map.of("drafts", DRAFTS.getBytes(StandardCharsets.UTF_8), "reference",
				REFERENCE.getBytes(StandardCharsets.UTF_8));
	}

	private Map<String, JsonNode> draftsBySourceId(long batchId) {
		Map<String, JsonNode> drafts = new HashMap<>();
		JsonNode cells = this.lead.get("/api/batches/" + batchId + "/cells").json();
		for (JsonNode cell : cells) {
			for (JsonNode draft : this.lead.get("/api/cells/" + cell.get("id").asLong() + "/drafts")
				.json()
				.get("features")) {
				drafts.put(draft.get("properties").get("sourceId").asString(), draft);
			}
		}
		assertThat(drafts).hasSize(3);
		return drafts;
	}

	private static JsonNode flag(JsonNode properties, String code) {
		for (JsonNode flag : properties.get("flags")) {
			if (code.equals(flag.get("code").asString())) {
				return flag;
			}
		}
		return null;
	}

	private static String collection(String... features) {
		return "{\"type\":\"FeatureCollection\",\"features\":[" + String.join(",", features) + "]}";
	}

	private static String road(String id, String kind, double confidence, double[][] coordinates) {
		StringBuilder line = new StringBuilder();
		for (double[] c : coordinates) {
			line.append((line.length() > 0) ? "," : "").append('[').append(c[0]).append(',').append(c[1]).append(']');
		}
		String properties = (confidence >= 0) ? "{\"kind\":\"" + kind + "\",\"confidence\":" + confidence + "}"
				: "{\"kind\":\"" + kind + "\"}";
		return "{\"type\":\"Feature\",\"id\":\"" + id + "\",\"properties\":" + properties
				+ ",\"geometry\":{\"type\":\"LineString\",\"coordinates\":[" + line + "]}}";
	}

}
