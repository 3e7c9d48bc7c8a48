package org.assay.flow;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.UUID;

import org.assay.accounts.AccountService;
import org.assay.accounts.Role;
import org.assay.support.ApiClient;
import org.assay.support.TestBatches;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import tools.jackson.databind.JsonNode;

import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.web.server.LocalServerPort;
import org.springframework.jdbc.core.JdbcTemplate;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * A whole batch from upload to export through the HTTP API: the scenarios, run by
 * subclasses on each database.
 */
abstract class BatchFlowScenarios {

	@LocalServerPort
	int port;

	@Autowired
	AccountService accounts;

	@Autowired
	JdbcTemplate jdbc;

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

	long upload(int roads, int buildings, int maxDraftsPerCell) {
		ApiClient.Response response = this.lead.upload(
				Map.of("name", "flow test", "modelName", "segmenter", "modelVersion", "3.1", "maxDraftsPerCell",
						String.valueOf(maxDraftsPerCell), "secondReviewShare", "0"),
				Map.of("drafts", TestBatches.drafts(roads, buildings), "reference", TestBatches.reference(roads)),
				"wait=true");
		assertThat(response.status()).as(response.text()).isEqualTo(201);
		return response.json().get("batchId").asLong();
	}

	@Test
	void aBatchGoesFromUploadThroughReviewToExport() {
		long batchId = upload(120, 40, 25);
		JsonNode batch = this.validator.get("/api/batches/" + batchId).json();
		assertThat(batch.get("draftCount").asInt()).isEqualTo(160);
		assertThat(batch.get("referenceCount").asInt()).isEqualTo(24);
		int cells = batch.get("cellCount").asInt();
		assertThat(cells).isGreaterThanOrEqualTo(160 / 25);

		Map<String, Integer> verdicts = new HashMap<>();
		List<Long> claimed = new ArrayList<>();
		for (ApiClient.Response claim = this.validator.post("/api/batches/" + batchId + "/claims/next", null); claim
			.status() == 200; claim = this.validator.post("/api/batches/" + batchId + "/claims/next", null)) {
			long cellId = claim.json().get("id").asLong();
			assertThat(claimed).doesNotContain(cellId);
			claimed.add(cellId);
			JsonNode drafts = this.validator.get("/api/cells/" + cellId + "/drafts").json();
			assertThat(this.validator.get("/api/cells/" + cellId + "/reference").status()).isEqualTo(200);
			for (JsonNode draft : drafts.get("features")) {
				decide(draft, verdicts);
			}
			JsonNode cell = this.validator.get("/api/cells/" + cellId).json();
			assertThat(cell.get("finished").asBoolean()).isTrue();
		}
		assertThat(claimed).hasSize(cells);

		JsonNode done = this.lead.get("/api/batches/" + batchId).json();
		assertThat(done.get("decidedCount").asInt()).isEqualTo(160);
		assertThat(done.get("finishedCells").asInt()).isEqualTo(cells);

		ApiClient.Response export = this.lead.get("/api/batches/" + batchId + "/export.geojson");
		assertThat(export.status()).isEqualTo(200);
		JsonNode collection = export.json();
		assertThat(collection.get("type").asString()).isEqualTo("FeatureCollection");
		assertThat(collection.get("assay").get("notice").asString()).contains("checked by people");
		int kept = verdicts.getOrDefault("ACCEPT", 0) + verdicts.getOrDefault("AMEND", 0);
		assertThat(collection.get("features")).hasSize(kept);
		for (JsonNode feature : collection.get("features")) {
			JsonNode properties = feature.get("properties");
			assertThat(properties.get("model_version").asString()).isEqualTo("3.1");
			assertThat(properties.get("validator_count").asInt()).isEqualTo(1);
			if ("AMEND".equals(properties.get("verdict").asString())) {
				assertThat(feature.get("geometry").get("coordinates").get(0).get(0).asDouble())
					.as("amended geometry exported")
					.isEqualTo(-31.75);
			}
		}
		assertThat(this.validator.get("/api/batches/" + batchId + "/export.geojson").status()).isEqualTo(403);
	}

	private void decide(JsonNode draft, Map<String, Integer> verdicts) {
		long draftId = draft.get("id").asLong();
		boolean road = "road".equals(draft.get("properties").get("kind").asString());
		Map<String, Object> body = new HashMap<>();
		body.put("draftId", draftId);
		String verdict;
		if (draftId % 7 == 0 && road) {
			verdict = "AMEND";
			body.put("reasonCode", "geometry-adjusted");
			body.put("geometry", Map.of("type", "LineString", "coordinates",
					List.of(List.of(-31.75, 40.9), List.of(-31.749, 40.9001))));
		}
		else if (draftId % 5 == 0) {
			verdict = "REJECT";
			body.put("reasonCode", "not-a-feature");
		}
		else if (draftId % 11 == 0) {
			verdict = "ESCALATE";
			body.put("reasonCode", "imagery-obscured");
		}
		else {
			verdict = "ACCEPT";
		}
		body.put("verdict", verdict);
		UUID id = UUID.randomUUID();
		ApiClient.Response first = this.validator.put("/api/verdicts/" + id, body);
		assertThat(first.status()).as(first.text()).isEqualTo(201);
		ApiClient.Response retry = this.validator.put("/api/verdicts/" + id, body);
		assertThat(retry.status()).as("a retry stores nothing new").isEqualTo(200);
		verdicts.merge(verdict, 1, Integer::sum);
	}

	@Test
	void aBadUploadNamesTheFeatureAndStoresNothing() {
		Integer before = this.jdbc.queryForObject("select count(*) from draft", Integer.class);
		String bad = "{\"type\":\"FeatureCollection\",\"features\":["
				+ "{\"type\":\"Feature\",\"id\":\"ok\",\"properties\":{\"kind\":\"road\",\"confidence\":0.5},"
				+ "\"geometry\":{\"type\":\"LineString\",\"coordinates\":[[0,0],[1,1]]}},"
				+ "{\"type\":\"Feature\",\"id\":\"bad-7\",\"properties\":{\"kind\":\"road\",\"confidence\":1.5},"
				+ "\"geometry\":{\"type\":\"LineString\",\"coordinates\":[[0,0],[1,1]]}}]}";
		ApiClient.Response response = this.lead.upload(Map.of("name", "bad"),
				Map.of("drafts", bad.getBytes(java.nio.charset.StandardCharsets.UTF_8)), "wait=true");
		assertThat(response.status()).isEqualTo(422);
		assertThat(response.header("Content-Type")).startsWith("application/problem+json");
		JsonNode problem = response.json();
		assertThat(problem.get("featureIndex").asInt()).isEqualTo(1);
		assertThat(problem.get("featureId").asString()).isEqualTo("bad-7");
		assertThat(problem.get("fault").asString()).isEqualTo("bad-confidence");
		assertThat(problem.get("detail").asString()).contains("bad-7").contains("Nothing of the batch was stored");
		assertThat(this.jdbc.queryForObject("select count(*) from draft", Integer.class)).isEqualTo(before);
		assertThat(this.jdbc.queryForObject("select count(*) from batch where name = 'bad'", Integer.class)).isZero();
	}

	@Test
	void aValidatorCannotUploadNorGiveVerdictsOnCellsTheyDoNotHold() {
		long batchId = upload(20, 0, 10);
		ApiClient.Response upload = this.validator.upload(Map.of("name", "x"),
				Map.of("drafts", TestBatches.drafts(1, 0)), "wait=true");
		assertThat(upload.status()).isEqualTo(403);
		long cellId = this.jdbc.queryForObject("select min(id) from cell where batch_id = ?", Long.class, batchId);
		long draftId = this.jdbc.queryForObject("select min(id) from draft where cell_id = ?", Long.class, cellId);
		assertThat(this.validator.get("/api/cells/" + cellId + "/drafts").status()).isEqualTo(403);
		ApiClient.Response verdict = this.validator.put("/api/verdicts/" + UUID.randomUUID(),
				Map.of("draftId", draftId, "verdict", "ACCEPT"));
		assertThat(verdict.status()).isEqualTo(409);
		assertThat(ApiClient.anonymous(this.port).get("/api/batches").status()).isEqualTo(401);
		String job = this.lead.upload(Map.of("name", "job"), Map.of("drafts", TestBatches.drafts(3, 0)), "wait=true")
			.json()
			.get("id")
			.asString();
		assertThat(this.lead.get("/api/uploads/" + job).status()).isEqualTo(200);
		assertThat(this.validator.get("/api/uploads/" + job).status()).as("another's upload job").isEqualTo(404);
	}

}
