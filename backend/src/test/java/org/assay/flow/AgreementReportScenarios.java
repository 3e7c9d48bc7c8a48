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

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * The agreement and calibration endpoints on a batch whose two review passes reproduce a
 * published contingency table: the SAS PROC FREQ (AGREE) example of 19 subjects rated by
 * two raters into three categories, as reproduced in statsmodels'
 * {@code statsmodels/stats/tests/test_inter_rater.py} (table10), rows the first rater:
 * <pre>
 *              second: ACCEPT AMEND REJECT
 * first ACCEPT            0     4     1
 * first AMEND             0     8     0
 * first REJECT            0     1     5
 * </pre> SAS prints kappa 0.4842, ASE 0.1380, 95% CI 0.2137 to 0.7547. Run by subclasses
 * on each database.
 */
abstract class AgreementReportScenarios {

	private static final String[] VERDICTS = { "ACCEPT", "AMEND", "REJECT" };

	private static final int[][] TABLE = { { 0, 4, 1 }, { 0, 8, 0 }, { 0, 1, 5 } };

	/** Printed to four decimals. */
	private static final double PRINTED = 0.00005 + 1e-12;

	@LocalServerPort
	int port;

	@Autowired
	AccountService accounts;

	ApiClient lead;

	ApiClient first;

	ApiClient second;

	String firstName;

	String secondName;

	@BeforeEach
	void signIn() {
		String suffix = UUID.randomUUID().toString().substring(0, 8);
		this.firstName = "a-" + suffix;
		this.secondName = "b-" + suffix;
		this.accounts.create("lead-" + suffix, "Lead " + suffix, "lead-pass-" + suffix, Role.LEAD);
		// created first, so the lower account id: the rows of the tables
		this.accounts.create(this.firstName, "First " + suffix, "a-pass-" + suffix, Role.VALIDATOR);
		this.accounts.create(this.secondName, "Second " + suffix, "b-pass-" + suffix, Role.VALIDATOR);
		this.lead = ApiClient.signIn(this.port, "lead-" + suffix, "lead-pass-" + suffix);
		this.first = ApiClient.signIn(this.port, this.firstName, "a-pass-" + suffix);
		this.second = ApiClient.signIn(this.port, this.secondName, "b-pass-" + suffix);
	}

	@Test
	void theAgreementEndpointsGiveThePublishedValuesForAPlantedTable() {
		long batchId = reviewTwice();

		JsonNode report = this.lead.get("/api/batches/" + batchId + "/agreement").json();
		JsonNode pair = report.get("pairs").get(0);
		assertThat(report.get("pairs")).hasSize(1);
		assertThat(pair.get("first").asString()).isEqualTo(this.firstName);
		JsonNode verdicts = pair.get("verdicts");
		assertThat(verdicts.get("drafts").asInt()).isEqualTo(19);
		// SAS PROC FREQ printout in statsmodels' test_inter_rater.py (see the class
		// comment)
		assertThat(verdicts.get("kappa").asDouble()).isCloseTo(0.4842, within(PRINTED));
		assertThat(verdicts.get("standardError").asDouble()).isCloseTo(0.1380, within(PRINTED));
		assertThat(verdicts.get("ci95").get(0).asDouble()).isCloseTo(0.2137, within(PRINTED));
		assertThat(verdicts.get("ci95").get(1).asDouble()).isCloseTo(0.7547, within(PRINTED));
		assertThat(verdicts.get("band").asString()).isEqualTo("moderate (Landis and Koch 1977)");
		// keep/drop by hand: {{12, 1}, {1, 5}}: p_o = 17/19, p_e = (13^2 + 6^2) / 19^2 =
		// 205/361, kappa = (323 - 205) / (361 - 205) = 118/156
		assertThat(pair.get("keepOrDrop").get("kappa").asDouble()).isCloseTo(118.0 / 156, within(1e-12));

		JsonNode team = report.get("team");
		assertThat(team.get("drafts").asInt()).isEqualTo(19);
		// by hand: with two ratings per draft Fleiss' kappa is Scott's pi (Fleiss 1971,
		// from memory): pooled shares 5/38, 21/38, 12/38, p_e = 610/1444, p_o = 13/19,
		// kappa = (988 - 610) / (1444 - 610) = 378/834
		assertThat(team.get("fleiss").get("kappa").asDouble()).isCloseTo(378.0 / 834, within(1e-12));
		// by hand from Krippendorff's definitions (nominal): n = 38 values, D_o = 12/38,
		// D_e = (38^2 - 610) / (38 * 37) = 834/1406, alpha = 1 - D_o / D_e = 1 -
		// 16872/31692
		assertThat(team.get("krippendorffAlpha").get("alpha").asDouble()).isCloseTo(1 - 16872.0 / 31692, within(1e-12));

		ApiClient.Response csv = this.lead.get("/api/batches/" + batchId + "/agreement/pairs.csv");
		assertThat(csv.status()).isEqualTo(200);
		assertThat(csv.header("Content-Type")).startsWith("text/csv");
		String[] lines = csv.text().split("\r\n");
		assertThat(lines).hasSize(2);
		assertThat(lines[0]).startsWith("first_validator,second_validator,drafts,observed_agreement,kappa");
		assertThat(lines[1]).startsWith(this.firstName + "," + this.secondName + ",19,0.684211,0.484163");
		assertThat(this.first.get("/api/batches/" + batchId + "/agreement").status()).as("leads only").isEqualTo(403);
		ApiClient.Response future = this.lead.get("/api/batches/" + batchId + "/agreement?from=2999-01-01T00:00:00Z");
		assertThat(future.json().get("pairs")).as("an empty window").isEmpty();
		assertThat(this.lead.get("/api/batches/" + batchId + "/agreement?from=yesterday").status()).isEqualTo(400);
	}

	@Test
	void validatorsAreMeasuredAgainstRulingsAndTheModelAgainstFinalVerdicts() {
		long batchId = reviewTwice();
		JsonNode rulings = this.lead.get("/api/batches/" + batchId + "/rulings").json();
		assertThat(rulings).as("the six disagreements").hasSize(6);
		// the lead upholds the first validator every time
		for (JsonNode ruling : rulings) {
			String verdict = ruling.get("first").get("verdict").asString();
			Map<String, Object> body = body(ruling.get("draftId").asLong(), verdict);
			ApiClient.Response given = this.lead.put("/api/rulings/" + UUID.randomUUID(), body);
			assertThat(given.status()).as(given.text()).isEqualTo(201);
		}
		Map<String, JsonNode> validators = new HashMap<>();
		this.lead.get("/api/batches/" + batchId + "/agreement")
			.json()
			.get("validators")
			.forEach((v) -> validators.put(v.get("validator").asString(), v));
		JsonNode a = validators.get(this.firstName);
		assertThat(a.get("reviewed").asInt()).isEqualTo(19);
		assertThat(a.get("agreedWithFinal").asInt()).isEqualTo(19);
		assertThat(a.get("ruled").asInt()).isEqualTo(6);
		assertThat(a.get("overturned").asInt()).isZero();
		assertThat(a.get("drops").asInt()).as("its REJECT against the second's AMEND").isEqualTo(1);
		assertThat(a.get("dropsUpheld").asInt()).isEqualTo(1);
		JsonNode b = validators.get(this.secondName);
		assertThat(b.get("agreedWithFinal").asInt()).isEqualTo(13);
		assertThat(b.get("overturned").asInt()).isEqualTo(6);
		assertThat(b.get("drops").asInt()).as("its REJECT against the first's ACCEPT").isEqualTo(1);
		assertThat(b.get("dropsUpheld").asInt()).isZero();
		// Wilson score interval of 13 of 19 is checked in WilsonIntervalTests; here the
		// share itself
		assertThat(b.get("agreementWithFinal").get("value").asDouble()).isCloseTo(13.0 / 19, within(1e-12));

		JsonNode calibration = this.lead.get("/api/batches/" + batchId + "/calibration?bands=10&target=0.5").json();
		int drafts = 0;
		int kept = 0;
		for (JsonNode band : calibration.get("bands")) {
			drafts += band.get("drafts").asInt();
			kept += band.get("accepted").asInt();
		}
		// final verdicts: 5 agreed REJECT and 1 ruled REJECT drop, the other 13 are kept
		assertThat(drafts).isEqualTo(19);
		assertThat(kept).isEqualTo(13);
		assertThat(calibration.get("bands")).hasSize(10);
		assertThat(calibration.get("threshold").get("target").asDouble()).isEqualTo(0.5);
		String csv = this.lead.get("/api/batches/" + batchId + "/calibration.csv").text();
		assertThat(csv.split("\r\n")).hasSize(11);
		assertThat(this.lead.get("/api/batches/" + batchId + "/calibration?bound=middle").status()).isEqualTo(400);
	}

	/** Uploads 19 roads in one cell and has both validators review them per TABLE. */
	private long reviewTwice() {
		ApiClient.Response upload = this.lead.upload(Map.of("name", "agreement", "maxDraftsPerCell", "40",
				"secondReviewShare", "1", "secondReviewSeed", "3"), Map.of("drafts", TestBatches.drafts(19, 0)),
				"wait=true");
		assertThat(upload.status()).as(upload.text()).isEqualTo(201);
		long batchId = upload.json().get("batchId").asLong();
		List<String[]> plan = new ArrayList<>();
		for (int i = 0; i < 3; i++) {
			for (int j = 0; j < 3; j++) {
				for (int n = 0; n < TABLE[i][j]; n++) {
					plan.add(new String[] { VERDICTS[i], VERDICTS[j] });
				}
			}
		}
		long cellId = claim(this.first, batchId, 1);
		List<Long> drafts = new ArrayList<>();
		this.first.get("/api/cells/" + cellId + "/drafts")
			.json()
			.get("features")
			.forEach((f) -> drafts.add(f.get("id").asLong()));
		assertThat(drafts).hasSize(19);
		for (int k = 0; k < drafts.size(); k++) {
			give(this.first, drafts.get(k), plan.get(k)[0]);
		}
		assertThat(claim(this.second, batchId, 2)).isEqualTo(cellId);
		for (int k = 0; k < drafts.size(); k++) {
			give(this.second, drafts.get(k), plan.get(k)[1]);
		}
		return batchId;
	}

	private static long claim(ApiClient client, long batchId, int pass) {
		ApiClient.Response claim = client.post("/api/batches/" + batchId + "/claims/next", null);
		assertThat(claim.status()).as(claim.text()).isEqualTo(200);
		assertThat(claim.json().get("pass").asInt()).isEqualTo(pass);
		return claim.json().get("id").asLong();
	}

	private static void give(ApiClient client, long draftId, String verdict) {
		ApiClient.Response given = client.put("/api/verdicts/" + UUID.randomUUID(), body(draftId, verdict));
		assertThat(given.status()).as(given.text()).isEqualTo(201);
	}

	private static Map<String, Object> body(long draftId, String verdict) {
		Map<String, Object> body = new HashMap<>(Map.of("draftId", draftId, "verdict", verdict));
		switch (verdict) {
			case "AMEND" -> {
				body.put("reasonCode", "geometry-adjusted");
				body.put("geometry", Map.of("type", "LineString", "coordinates",
						List.of(List.of(-31.7, 40.9), List.of(-31.699, 40.9001))));
			}
			case "REJECT" -> body.put("reasonCode", "not-a-feature");
			default -> {
			}
		}
		return body;
	}

}
