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

/**
 * Blind second review and rulings through the HTTP API, with planted disagreements: run
 * by subclasses on each database.
 */
abstract class SecondReviewScenarios {

	@LocalServerPort
	int port;

	@Autowired
	AccountService accounts;

	ApiClient lead;

	ApiClient first;

	ApiClient second;

	@BeforeEach
	void signIn() {
		String suffix = UUID.randomUUID().toString().substring(0, 8);
		this.accounts.create("lead-" + suffix, "Lead " + suffix, "lead-pass-" + suffix, Role.LEAD);
		this.accounts.create("one-" + suffix, "First " + suffix, "one-pass-" + suffix, Role.VALIDATOR);
		this.accounts.create("two-" + suffix, "Second " + suffix, "two-pass-" + suffix, Role.VALIDATOR);
		this.lead = ApiClient.signIn(this.port, "lead-" + suffix, "lead-pass-" + suffix);
		this.first = ApiClient.signIn(this.port, "one-" + suffix, "one-pass-" + suffix);
		this.second = ApiClient.signIn(this.port, "two-" + suffix, "two-pass-" + suffix);
	}

	@Test
	void disagreementsOfABlindSecondReviewReachTheRulingQueueAndTheRulingIsExported() {
		long batchId = upload("1");
		JsonNode cell = claim(this.first, batchId);
		assertThat(cell.get("pass").asInt()).isEqualTo(1);
		long cellId = cell.get("id").asLong();
		// the first validator rejects every fourth road as not a real feature
		List<String> disputed = new ArrayList<>();
		for (JsonNode draft : drafts(this.first, cellId)) {
			int n = number(draft);
			if (n % 4 == 0) {
				disputed.add(draft.get("properties").get("sourceId").asString());
				give(this.first, draft, "REJECT", "not-a-feature");
			}
			else {
				give(this.first, draft, "ACCEPT", null);
			}
		}
		assertThat(disputed).isNotEmpty();
		assertThat(this.first.get("/api/cells/" + cellId).json().get("finished").asBoolean()).isTrue();
		JsonNode next = claim(this.first, batchId);
		assertThat(next.get("id").asLong()).as("never the second review of one's own cell").isNotEqualTo(cellId);
		assertThat(next.get("pass").asInt()).isEqualTo(1);
		assertThat(this.first.post("/api/cells/" + next.get("id").asLong() + "/release", null).status())
			.isLessThan(300);

		JsonNode blind = claim(this.second, batchId);
		assertThat(blind.get("id").asLong()).as("the finished cell's second pass first").isEqualTo(cellId);
		assertThat(blind.get("pass").asInt()).isEqualTo(2);
		assertThat(blind.get("decidedCount").asInt()).isZero();
		assertThat(blind.get("finished").asBoolean()).isFalse();
		JsonNode seen = this.second.get("/api/cells/" + cellId + "/drafts").json().get("features");
		for (JsonNode draft : seen) {
			assertThat(draft.get("properties").get("verdict").isNull())
				.as("the second validator does not see the first verdicts")
				.isTrue();
		}
		// the second validator accepts everything: each rejected road becomes a
		// disagreement
		for (JsonNode draft : seen) {
			give(this.second, draft, "ACCEPT", null);
		}
		JsonNode done = this.second.get("/api/cells/" + cellId).json();
		assertThat(done.get("pass").asInt()).isEqualTo(2);
		assertThat(done.get("finished").asBoolean()).isTrue();

		assertThat(this.second.get("/api/batches/" + batchId + "/rulings").status()).isEqualTo(403);
		JsonNode rulings = this.lead.get("/api/batches/" + batchId + "/rulings").json();
		assertThat(rulings).hasSize(disputed.size());
		for (JsonNode ruling : rulings) {
			assertThat(ruling.get("cause").asString()).isEqualTo("disagreement");
			assertThat(disputed).contains(ruling.get("sourceId").asString());
			assertThat(ruling.get("first").get("verdict").asString()).isEqualTo("REJECT");
			assertThat(ruling.get("second").get("verdict").asString()).isEqualTo("ACCEPT");
		}
		Map<String, JsonNode> exported = exported(batchId);
		assertThat(exported.keySet()).as("agreed drafts are final, disputed ones wait")
			.doesNotContainAnyElementsOf(disputed)
			.hasSize(seen.size() - disputed.size());

		// the lead upholds the first validator on all but one disputed draft
		String keep = rulings.get(0).get("sourceId").asString();
		for (JsonNode ruling : rulings) {
			boolean accept = ruling.get("sourceId").asString().equals(keep);
			Map<String, Object> body = new HashMap<>(Map.of("draftId", ruling.get("draftId").asLong(), "verdict",
					accept ? "ACCEPT" : "REJECT", "comment", "ruled in review"));
			if (!accept) {
				body.put("reasonCode", "not-a-feature");
			}
			UUID id = UUID.randomUUID();
			ApiClient.Response given = this.lead.put("/api/rulings/" + id, body);
			assertThat(given.status()).as(given.text()).isEqualTo(201);
			assertThat(this.lead.put("/api/rulings/" + id, body).status()).as("a retry").isEqualTo(200);
			assertThat(this.lead.put("/api/rulings/" + UUID.randomUUID(), body).status()).as("a draft is ruled once")
				.isEqualTo(409);
		}
		assertThat(this.lead.get("/api/batches/" + batchId + "/rulings").json()).isEmpty();
		exported = exported(batchId);
		assertThat(exported).hasSize(seen.size() - disputed.size() + 1).containsKey(keep);
		assertThat(exported.get(keep).get("properties").get("verdict").asString()).isEqualTo("ACCEPT");
	}

	@Test
	void anEscalationInASingleReviewReachesTheRulingQueueWhenTheCellIsFinished() {
		long batchId = upload("0");
		JsonNode cell = claim(this.first, batchId);
		long cellId = cell.get("id").asLong();
		List<JsonNode> drafts = new ArrayList<>();
		drafts(this.first, cellId).forEach(drafts::add);
		give(this.first, drafts.get(0), "ESCALATE", "imagery-obscured");
		assertThat(this.lead.get("/api/batches/" + batchId + "/rulings").json()).as("not before the cell is finished")
			.isEmpty();
		for (JsonNode draft : drafts.subList(1, drafts.size())) {
			give(this.first, draft, "ACCEPT", null);
		}
		JsonNode rulings = this.lead.get("/api/batches/" + batchId + "/rulings").json();
		assertThat(rulings).hasSize(1);
		assertThat(rulings.get(0).get("cause").asString()).isEqualTo("escalation");
		assertThat(rulings.get(0).get("second").isNull()).isTrue();
		JsonNode other = claim(this.second, batchId);
		assertThat(other.get("pass").asInt()).as("no second review at a share of 0").isEqualTo(1);
	}

	@Test
	void aLeadChangesTheShareForCellsNobodyHasTouched() {
		long batchId = upload("0");
		long started = claim(this.first, batchId).get("id").asLong();
		ApiClient.Response changed = this.lead.put("/api/batches/" + batchId + "/second-review",
				Map.of("share", 1, "seed", 11));
		assertThat(changed.status()).as(changed.text()).isEqualTo(200);
		// four cells of ten drafts; the claimed one keeps its mark
		assertThat(changed.json().get("cellsChanged").asInt()).isEqualTo(3);
		assertThat(changed.json().get("cellsChosen").asInt()).isEqualTo(3);
		assertThat(changed.json().get("share").asDouble()).isEqualTo(1.0);
		assertThat(changed.json().get("seed").asLong()).isEqualTo(11);
		assertThat(this.first.put("/api/batches/" + batchId + "/second-review", Map.of("share", 0.5)).status())
			.isEqualTo(403);
		assertThat(this.lead.put("/api/batches/" + batchId + "/second-review", Map.of("share", 2)).status())
			.isEqualTo(400);
		assertThat(started).isPositive();
	}

	private long upload(String share) {
		ApiClient.Response response = this.lead.upload(Map.of("name", "second review", "maxDraftsPerCell", "10",
				"secondReviewShare", share, "secondReviewSeed", "7"), Map.of("drafts", TestBatches.drafts(40, 0)),
				"wait=true");
		assertThat(response.status()).as(response.text()).isEqualTo(201);
		return response.json().get("batchId").asLong();
	}

	private static JsonNode claim(ApiClient client, long batchId) {
		ApiClient.Response claim = client.post("/api/batches/" + batchId + "/claims/next", null);
		assertThat(claim.status()).as(claim.text()).isEqualTo(200);
		return claim.json();
	}

	private static JsonNode drafts(ApiClient client, long cellId) {
		return client.get("/api/cells/" + cellId + "/drafts").json().get("features");
	}

	private static int number(JsonNode draft) {
		return Integer.parseInt(draft.get("properties").get("sourceId").asString().substring(2));
	}

	private static void give(ApiClient client, JsonNode draft, String verdict, String reason) {
		Map<String, Object> body = new HashMap<>(Map.of("draftId", draft.get("id").asLong(), "verdict", verdict));
		if (reason != null) {
			body.put("reasonCode", reason);
		}
		ApiClient.Response given = client.put("/api/verdicts/" + UUID.randomUUID(), body);
		assertThat(given.status()).as(given.text()).isEqualTo(201);
	}

	private Map<String, JsonNode> exported(long batchId) {
		Map<String, JsonNode> out = new HashMap<>();
		this.lead.get("/api/batches/" + batchId + "/export.geojson")
			.json()
			.get("features")
			.forEach((f) -> out.put(f.get("properties").get("source_id").asString(), f));
		return out;
	}

}
