package org.assay.demo;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.UUID;

import org.assay.support.ApiClient;
import org.junit.jupiter.api.Test;
import tools.jackson.databind.JsonNode;

import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.web.server.LocalServerPort;
import org.springframework.jdbc.core.JdbcTemplate;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The demo batch as the server loads it through the upload job: the checks flag its
 * planted faults (judged against the generator's truth, never the checks' own output),
 * and a blind second review with planted disagreements on it goes through the ruling
 * queue to the export. Demo accounts and passwords: {@link DemoPerson#TEAM}.
 */
// a context of its own (the extra property), so that the browser tests' demo stays
// untouched
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT,
		properties = { "assay.demo.enabled=true", "assay.test.context=demo-batch" })
class DemoBatchIntegrationTests {

	@LocalServerPort
	int port;

	@Autowired
	JdbcTemplate jdbc;

	@Test
	void theUploadedDemoBatchCarriesTheFlagsOfItsPlantedFaults() {
		DemoScenario scenario = DemoScenario.generate();
		Map<String, String> stored = new HashMap<>();
		this.jdbc.query("select source_id, flags from draft where batch_id = (select min(id) from batch)",
				(org.springframework.jdbc.core.RowCallbackHandler) (rs) -> stored.put(rs.getString(1),
						(rs.getString(2) != null) ? rs.getString(2) : ""));
		assertThat(stored).hasSize(scenario.drafts().size());
		Map<FaultClass, int[]> flaggedByClass = new TreeMap<>();
		for (PlantedFault truth : scenario.truth().values()) {
			String flags = stored.get(truth.draftId());
			int[] counts = flaggedByClass.computeIfAbsent(truth.faultClass(), (k) -> new int[3]);
			counts[0]++;
			counts[1] += flags.contains("\"mapped-already\"") ? 1 : 0;
			counts[2] += flags.contains("\"extends-mapped\"") ? 1 : 0;
			if (truth.faultClass() == FaultClass.ALREADY_MAPPED) {
				assertThat(flags).as("planted duplicate %s", truth.draftId()).contains("\"mapped-already\"");
			}
			if (truth.faultClass() == FaultClass.PARTIAL) {
				assertThat(flags).as("planted continuation %s", truth.draftId()).contains("\"extends-mapped\"");
			}
		}
		System.out.println("Demo upload, drafts per true class: total, flagged mapped-already, flagged extends-mapped");
		flaggedByClass.forEach(
				(fault, counts) -> System.out.printf("  %-16s %5d %5d %5d%n", fault, counts[0], counts[1], counts[2]));
		assertThat(flaggedByClass.get(FaultClass.GOOD)[1]).as("good drafts flagged as duplicates").isZero();
	}

	@Test
	void aSecondReviewOfADemoCellWithPlantedDisagreementsEndsInRulingsAndTheExport() {
		ApiClient kasimir = ApiClient.signIn(this.port, "kasimir", "amber-reed-3146");
		ApiClient priya = ApiClient.signIn(this.port, "priya", "quiet-gull-5621");
		ApiClient tamsin = ApiClient.signIn(this.port, "tamsin", "harbour-kite-2719");
		long batchId = kasimir.get("/api/batches").json().get(0).get("id").asLong();
		Map<String, PlantedFault> truth = DemoScenario.generate().truth();

		// kasimir rejects what the truth says is not a new road, accepts the rest
		JsonNode cell = kasimir.post("/api/batches/" + batchId + "/claims/next", null).json();
		long cellId = cell.get("id").asLong();
		List<String> rejected = new ArrayList<>();
		List<String> accepted = new ArrayList<>();
		for (JsonNode draft : kasimir.get("/api/cells/" + cellId + "/drafts").json().get("features")) {
			String sourceId = draft.get("properties").get("sourceId").asString();
			PlantedFault fault = truth.get(sourceId);
			boolean drop = fault != null && (fault.faultClass() == FaultClass.FALSE_DETECTION
					|| fault.faultClass() == FaultClass.ALREADY_MAPPED);
			give(kasimir, draft.get("id").asLong(), drop ? "REJECT" : "ACCEPT",
					(fault != null && fault.faultClass() == FaultClass.ALREADY_MAPPED) ? "already-mapped"
							: "not-a-feature");
			(drop ? rejected : accepted).add(sourceId);
		}
		assertThat(rejected).as("the riskiest demo cell holds planted faults").isNotEmpty();

		// the first cell kasimir finishes is reviewed again (each first validator gets
		// one)
		JsonNode blind = priya.post("/api/batches/" + batchId + "/claims/next", null).json();
		assertThat(blind.get("id").asLong()).isEqualTo(cellId);
		assertThat(blind.get("pass").asInt()).isEqualTo(2);
		for (JsonNode draft : priya.get("/api/cells/" + cellId + "/drafts").json().get("features")) {
			assertThat(draft.get("properties").get("verdict").isNull()).isTrue();
			give(priya, draft.get("id").asLong(), "ACCEPT", null);
		}

		JsonNode rulings = tamsin.get("/api/batches/" + batchId + "/rulings").json();
		List<String> disputed = new ArrayList<>();
		rulings.forEach((r) -> disputed.add(r.get("sourceId").asString()));
		assertThat(disputed).as("exactly the planted disagreements").containsExactlyInAnyOrderElementsOf(rejected);
		for (JsonNode ruling : rulings) {
			Map<String, Object> body = Map.of("draftId", ruling.get("draftId").asLong(), "verdict", "REJECT",
					"reasonCode", ruling.get("first").get("reasonCode").asString());
			assertThat(tamsin.put("/api/rulings/" + UUID.randomUUID(), body).status()).isEqualTo(201);
		}
		assertThat(tamsin.get("/api/batches/" + batchId + "/rulings").json()).isEmpty();

		Map<String, String> exported = new HashMap<>();
		tamsin.get("/api/batches/" + batchId + "/export.geojson")
			.json()
			.get("features")
			.forEach((f) -> exported.put(f.get("properties").get("source_id").asString(),
					f.get("properties").get("verdict").asString()));
		assertThat(exported.keySet()).containsAll(accepted).doesNotContainAnyElementsOf(rejected);

		// the other two downloads of the lead's view: the GeoPackage and the training
		// set,
		// whose drafts are exactly the rejected ones, each with masks
		ApiClient.Response gpkg = tamsin.get("/api/batches/" + batchId + "/export.gpkg");
		assertThat(gpkg.status()).isEqualTo(200);
		assertThat(new String(gpkg.body(), 0, 15, java.nio.charset.StandardCharsets.US_ASCII))
			.isEqualTo("SQLite format 3");
		ApiClient.Response zip = tamsin.get("/api/batches/" + batchId + "/training.zip");
		assertThat(zip.status()).isEqualTo(200);
		Map<String, byte[]> entries = new HashMap<>();
		try (java.util.zip.ZipInputStream in = new java.util.zip.ZipInputStream(
				new java.io.ByteArrayInputStream(zip.body()))) {
			for (var entry = in.getNextEntry(); entry != null; entry = in.getNextEntry()) {
				entries.put(entry.getName(), in.readAllBytes());
			}
		}
		catch (java.io.IOException ex) {
			throw new java.io.UncheckedIOException(ex);
		}
		List<String> trained = new ArrayList<>();
		JsonNode features = new tools.jackson.databind.ObjectMapper().readTree(entries.get("drafts.geojson"))
			.get("features");
		features.forEach((f) -> trained.add(f.get("properties").get("source_id").asString()));
		assertThat(trained).containsExactlyInAnyOrderElementsOf(rejected);
		assertThat(entries.keySet()).anyMatch((name) -> name.startsWith("masks/18/"));
	}

	private static void give(ApiClient client, long draftId, String verdict, String reason) {
		Map<String, Object> body = new HashMap<>(Map.of("draftId", draftId, "verdict", verdict));
		if (!"ACCEPT".equals(verdict)) {
			body.put("reasonCode", reason);
		}
		ApiClient.Response given = client.put("/api/verdicts/" + UUID.randomUUID(), body);
		assertThat(given.status()).as(given.text()).isEqualTo(201);
	}

}
