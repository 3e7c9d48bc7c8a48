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
 * Undo ({@code POST /api/verdicts/{id}/withdrawal}) in the first and the blind second
 * review, and the validator's own progress, through the HTTP API: run by subclasses on
 * each database.
 */
abstract class UndoScenarios {

	@LocalServerPort
	int port;

	@Autowired
	AccountService accounts;

	@Autowired
	JdbcTemplate jdbc;

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
	void undoRestoresThePreviousVerdictThenUndecidedAndOpensAFinishedCellAgain() {
		long batchId = upload("0");
		long cellId = claim(this.first, batchId).get("id").asLong();
		List<JsonNode> drafts = drafts(this.first, cellId);
		List<UUID> given = new ArrayList<>();
		for (JsonNode draft : drafts) {
			given.add(give(this.first, draft, "ACCEPT", null));
		}
		JsonNode last = drafts.get(drafts.size() - 1);
		long lastId = last.get("id").asLong();
		UUID changed = give(this.first, last, "REJECT", "not-a-feature");
		assertThat(cell(this.first, cellId).get("finished").asBoolean()).isTrue();

		assertThat(withdraw(this.second, changed).status()).as("only the author").isEqualTo(403);
		assertThat(withdraw(this.first, given.get(0)).status()).as("not the latest").isEqualTo(409);

		ApiClient.Response undone = withdraw(this.first, changed);
		assertThat(undone.status()).as(undone.text()).isEqualTo(201);
		assertThat(undone.json().get("restored").get("id").asString())
			.isEqualTo(given.get(given.size() - 1).toString());
		assertThat(undone.json().get("restored").get("verdict").asString()).isEqualTo("ACCEPT");
		assertThat(undone.json().get("cell").get("decidedCount").asInt()).isEqualTo(drafts.size());
		assertThat(currentVerdict(lastId)).isEqualTo("ACCEPT");
		assertThat(passVerdict(lastId, 1)).isEqualTo("ACCEPT");
		assertThat(withdraw(this.first, changed).status()).as("a retried undo").isEqualTo(200);

		ApiClient.Response again = withdraw(this.first, given.get(given.size() - 1));
		assertThat(again.status()).as(again.text()).isEqualTo(201);
		assertThat(again.json().get("restored").isNull()).isTrue();
		assertThat(again.json().get("cell").get("decidedCount").asInt()).isEqualTo(drafts.size() - 1);
		JsonNode open = cell(this.first, cellId);
		assertThat(open.get("finished").asBoolean()).as("the cell is open again").isFalse();
		assertThat(open.get("holder").asString()).as("and still claimed").startsWith("one-");
		assertThat(currentVerdict(lastId)).isNull();
		assertThat(passVerdict(lastId, 1)).isNull();
		assertThat(this.jdbc.queryForObject("select decided_count from cell where id = ?", Integer.class, cellId))
			.isEqualTo(drafts.size() - 1);

		// the verdicts stay in the log, marked withdrawn; a resent verdict is not stored
		// again
		assertThat(this.jdbc.queryForObject("select count(*) from verdict where cell_id = ?", Integer.class, cellId))
			.isEqualTo(drafts.size() + 1);
		assertThat(this.jdbc.queryForObject(
				"select count(*) from verdict_withdrawal w join verdict v on v.id = w.verdict_id where v.cell_id = ?",
				Integer.class, cellId))
			.isEqualTo(2);
		assertThat(this.first.put("/api/verdicts/" + changed, body(last, "REJECT", "not-a-feature")).status())
			.as("a resend of a withdrawn verdict")
			.isEqualTo(200);
		assertThat(currentVerdict(lastId)).isNull();

		give(this.first, last, "AMEND", null, true);
		assertThat(cell(this.first, cellId).get("finished").asBoolean()).isTrue();

		JsonNode mine = this.first.get("/api/my/progress").json();
		assertThat(mine.get("verdicts").get("ACCEPT").asInt()).isEqualTo(drafts.size() - 1);
		assertThat(mine.get("verdicts").get("AMEND").asInt()).isEqualTo(1);
		assertThat(mine.get("decided").asInt()).isEqualTo(drafts.size());
		assertThat(mine.get("withdrawn").asInt()).isEqualTo(2);
		assertThat(mine.get("cellsFinished").asInt()).isEqualTo(1);
		assertThat(mine.get("cells")).as("a finished cell is no longer listed").isEmpty();
	}

	@Test
	void aFirstReviewUndoThatOpensTheCellAgainRemovesTheSecondPassNobodyHasTaken() {
		long batchId = upload("1");
		long cellId = claim(this.first, batchId).get("id").asLong();
		List<JsonNode> drafts = drafts(this.first, cellId);
		UUID last = null;
		for (JsonNode draft : drafts) {
			last = give(this.first, draft, "ACCEPT", null);
		}
		assertThat(secondPasses(cellId)).isEqualTo(1);
		assertThat(withdraw(this.first, last).status()).isEqualTo(201);
		assertThat(secondPasses(cellId)).as("the untaken second pass is gone").isZero();
		last = give(this.first, drafts.get(drafts.size() - 1), "REJECT", "not-a-feature");
		assertThat(secondPasses(cellId)).as("open again once the cell is finished").isEqualTo(1);

		JsonNode blind = claim(this.second, batchId);
		assertThat(blind.get("id").asLong()).isEqualTo(cellId);
		assertThat(blind.get("pass").asInt()).isEqualTo(2);
		ApiClient.Response refused = withdraw(this.first, last);
		assertThat(refused.status()).as("the second review has begun").isEqualTo(409);
		assertThat(currentVerdict(drafts.get(drafts.size() - 1).get("id").asLong())).isEqualTo("REJECT");
	}

	@Test
	void aSecondReviewUndoOpensTheFinishedPassAgainAndTakesItsRulingCasesBack() {
		long batchId = upload("1");
		long cellId = claim(this.first, batchId).get("id").asLong();
		List<JsonNode> drafts = drafts(this.first, cellId);
		give(this.first, drafts.get(0), "REJECT", "not-a-feature");
		for (JsonNode draft : drafts.subList(1, drafts.size())) {
			give(this.first, draft, "ACCEPT", null);
		}
		assertThat(claim(this.second, batchId).get("pass").asInt()).isEqualTo(2);
		List<JsonNode> blind = drafts(this.second, cellId);
		UUID last = null;
		for (JsonNode draft : blind) {
			last = give(this.second, draft, "ACCEPT", null);
		}
		assertThat(cell(this.second, cellId).get("finished").asBoolean()).isTrue();
		assertThat(rulings(batchId)).as("the first draft is disputed").isEqualTo(1);

		UUID firstOwn = this.jdbc.queryForObject(
				"select verdict_id from pass_verdict where draft_id = ? and review_pass = 1", UUID.class,
				drafts.get(drafts.size() - 1).get("id").asLong());
		assertThat(withdraw(this.first, firstOwn).status()).as("the first validator holds no claim on it")
			.isEqualTo(409);
		ApiClient.Response undone = withdraw(this.second, last);
		assertThat(undone.status()).as(undone.text()).isEqualTo(201);
		assertThat(undone.json().get("cell").get("decidedCount").asInt()).isEqualTo(blind.size() - 1);
		JsonNode open = cell(this.second, cellId);
		assertThat(open.get("pass").asInt()).isEqualTo(2);
		assertThat(open.get("finished").asBoolean()).isFalse();
		assertThat(open.get("holder").asString()).startsWith("two-");
		assertThat(passVerdict(blind.get(blind.size() - 1).get("id").asLong(), 2)).isNull();
		assertThat(passVerdict(blind.get(blind.size() - 1).get("id").asLong(), 1)).as("the first review stands")
			.isEqualTo("ACCEPT");
		assertThat(rulings(batchId)).as("no ruling until both reviews are in").isZero();

		give(this.second, blind.get(blind.size() - 1), "ACCEPT", null);
		assertThat(rulings(batchId)).isEqualTo(1);
		assertThat(this.second.get("/api/my/progress").json().get("cellsFinished").asInt()).isEqualTo(1);

		// a changed mind on the disputed draft, then the lead's ruling: that verdict
		// stands
		UUID changed = give(this.second, drafts.get(0), "REJECT", "not-a-feature");
		assertThat(rulings(batchId)).as("the passes agree now").isZero();
		give(this.second, drafts.get(0), "ACCEPT", null);
		assertThat(rulings(batchId)).isEqualTo(1);
		ApiClient.Response ruled = this.lead.put("/api/rulings/" + UUID.randomUUID(),
				Map.of("draftId", drafts.get(0).get("id").asLong(), "verdict", "ACCEPT", "comment", "ruled"));
		assertThat(ruled.status()).as(ruled.text()).isEqualTo(201);
		UUID latest = this.jdbc.queryForObject(
				"select verdict_id from pass_verdict where draft_id = ? and review_pass = 2", UUID.class,
				drafts.get(0).get("id").asLong());
		assertThat(latest).isNotEqualTo(changed);
		ApiClient.Response refused = withdraw(this.second, latest);
		assertThat(refused.status()).as("a ruled draft's verdicts stand").isEqualTo(409);
		assertThat(refused.text()).contains("ruled");
	}

	private long upload(String share) {
		ApiClient.Response response = this.lead.upload(
				Map.of("name", "undo", "maxDraftsPerCell", "10", "secondReviewShare", share, "secondReviewSeed", "7"),
				Map.of("drafts", TestBatches.drafts(40, 0)), "wait=true");
		assertThat(response.status()).as(response.text()).isEqualTo(201);
		return response.json().get("batchId").asLong();
	}

	private static JsonNode claim(ApiClient client, long batchId) {
		ApiClient.Response claim = client.post("/api/batches/" + batchId + "/claims/next", null);
		assertThat(claim.status()).as(claim.text()).isEqualTo(200);
		return claim.json();
	}

	private static JsonNode cell(ApiClient client, long cellId) {
		return client.get("/api/cells/" + cellId).json();
	}

	private static List<JsonNode> drafts(ApiClient client, long cellId) {
		List<JsonNode> out = new ArrayList<>();
		client.get("/api/cells/" + cellId + "/drafts").json().get("features").forEach(out::add);
		return out;
	}

	private static ApiClient.Response withdraw(ApiClient client, UUID id) {
		return client.post("/api/verdicts/" + id + "/withdrawal", null);
	}

	private static Map<String, Object> body(JsonNode draft, String verdict, String reason) {
		Map<String, Object> body = new HashMap<>(Map.of("draftId", draft.get("id").asLong(), "verdict", verdict));
		if (reason != null) {
			body.put("reasonCode", reason);
		}
		return body;
	}

	private static UUID give(ApiClient client, JsonNode draft, String verdict, String reason) {
		return give(client, draft, verdict, reason, false);
	}

	// an AMEND sends the draft's own geometry
	private static UUID give(ApiClient client, JsonNode draft, String verdict, String reason, boolean amend) {
		Map<String, Object> body = body(draft, verdict, reason);
		if (amend) {
			body.put("geometry", draft.get("geometry"));
			body.put("reasonCode", "geometry-adjusted");
		}
		UUID id = UUID.randomUUID();
		ApiClient.Response given = client.put("/api/verdicts/" + id, body);
		assertThat(given.status()).as(given.text()).isEqualTo(201);
		return id;
	}

	private String currentVerdict(long draftId) {
		return this.jdbc.queryForList("select verdict from current_verdict where draft_id = ?", String.class, draftId)
			.stream()
			.findFirst()
			.orElse(null);
	}

	private String passVerdict(long draftId, int pass) {
		return this.jdbc
			.queryForList("select verdict from pass_verdict where draft_id = ? and review_pass = ?", String.class,
					draftId, pass)
			.stream()
			.findFirst()
			.orElse(null);
	}

	private int secondPasses(long cellId) {
		return this.jdbc.queryForObject("select count(*) from second_pass where cell_id = ?", Integer.class, cellId);
	}

	private int rulings(long batchId) {
		return this.lead.get("/api/batches/" + batchId + "/rulings").json().size();
	}

}
