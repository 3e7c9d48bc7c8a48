package org.assay.reports;

import java.time.Duration;
import java.time.Instant;
import java.time.OffsetDateTime;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.UUID;

import org.assay.accounts.AccountService;
import org.assay.accounts.Role;
import org.assay.support.ApiClient;
import org.assay.support.MovableClock;
import org.assay.support.TestBatches;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import tools.jackson.databind.JsonNode;

import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.TestConfiguration;
import org.springframework.boot.test.web.server.LocalServerPort;
import org.springframework.context.annotation.Bean;
import org.springframework.context.annotation.Primary;
import org.springframework.jdbc.core.JdbcTemplate;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * The lead's dashboard on a hand-built verdict history, written straight into the verdict
 * log; every expected figure is worked out by hand in the comments. The batch (20 roads)
 * is uploaded at 2026-06-01T08:00Z; the dashboard is read at 2026-06-03T12:00Z.
 *
 * <pre>
 * validator a: 06-01 09:00:00 ACCEPT, 09:00:30 ACCEPT, 09:01:30 ACCEPT, 09:02:00 ACCEPT,
 *              09:30:00 REJECT not-a-feature (after a 28 min break), 09:30:40 REJECT not-a-feature,
 *              06-02 09:00:00 AMEND geometry-adjusted, 09:00:20 AMEND geometry-adjusted
 * validator b: 06-01 10:00:00 ACCEPT, 10:00:10 ACCEPT, 10:00:30 REJECT already-mapped,
 *              10:00:40 REJECT (withdrawn: not counted), 06-02 20:00:00 ACCEPT
 * </pre>
 *
 * Run by subclasses on each database.
 */
abstract class DashboardScenarios {

	static final Instant UPLOADED = Instant.parse("2026-06-01T08:00:00Z");

	@TestConfiguration
	static class Time {

		@Bean
		@Primary
		MovableClock movableClock() {
			return new MovableClock();
		}

	}

	@LocalServerPort
	int port;

	@Autowired
	AccountService accounts;

	@Autowired
	JdbcTemplate jdbc;

	@Autowired
	MovableClock clock;

	ApiClient lead;

	ApiClient validator;

	String a;

	String b;

	long batchId;

	@BeforeEach
	void buildTheHistory() {
		// the clock starts at 2026-06-01T08:00Z for every test class; move it back there
		this.clock.advance(Duration.between(this.clock.instant(), UPLOADED));
		String suffix = UUID.randomUUID().toString().substring(0, 8);
		this.a = "a-" + suffix;
		this.b = "b-" + suffix;
		this.accounts.create("lead-" + suffix, "Lead " + suffix, "lead-pass-" + suffix, Role.LEAD);
		long aId = this.accounts.create(this.a, "A " + suffix, "a-pass-" + suffix, Role.VALIDATOR).id();
		long bId = this.accounts.create(this.b, "B " + suffix, "b-pass-" + suffix, Role.VALIDATOR).id();
		this.lead = ApiClient.signIn(this.port, "lead-" + suffix, "lead-pass-" + suffix);
		this.validator = ApiClient.signIn(this.port, this.a, "a-pass-" + suffix);
		ApiClient.Response upload = this.lead.upload(
				Map.of("name", "dashboard", "modelName", "m", "modelVersion", "1", "secondReviewShare", "0"),
				Map.of("drafts", TestBatches.drafts(20, 0)), "wait=true");
		assertThat(upload.status()).as(upload.text()).isEqualTo(201);
		this.batchId = upload.json().get("batchId").asLong();
		this.jdbc.update("update batch set created_at = ? where id = ?", UPLOADED.atOffset(java.time.ZoneOffset.UTC),
				this.batchId);
		List<long[]> drafts = this.jdbc.query("select id, cell_id from draft where batch_id = ? order by seq",
				(rs, n) -> new long[] { rs.getLong(1), rs.getLong(2) }, this.batchId);
		int[] next = { 0 };
		java.util.function.BiConsumer<Object[], Boolean> give = (v, withdrawn) -> {
			long[] draft = drafts.get(next[0]++);
			UUID id = UUID.randomUUID();
			OffsetDateTime at = OffsetDateTime.parse((String) v[1]);
			this.jdbc.update(
					"insert into verdict (id, draft_id, cell_id, batch_id, validator_id, verdict, reason_code,"
							+ " created_at, review_pass) values (?, ?, ?, ?, ?, ?, ?, ?, 1)",
					id, draft[0], draft[1], this.batchId, v[0], v[2], v[3], at);
			if (withdrawn) {
				this.jdbc.update(
						"insert into verdict_withdrawal (verdict_id, withdrawn_by, withdrawn_at)" + " values (?, ?, ?)",
						id, v[0], at.plusSeconds(5));
			}
			else {
				this.jdbc.update(
						"insert into current_verdict (draft_id, verdict_id, cell_id, batch_id, verdict,"
								+ " validator_id, decided_at) values (?, ?, ?, ?, ?, ?, ?)",
						draft[0], id, draft[1], this.batchId, v[2], v[0], at);
			}
		};
		give.accept(new Object[] { aId, "2026-06-01T09:00:00Z", "ACCEPT", "as-drafted" }, false);
		give.accept(new Object[] { aId, "2026-06-01T09:00:30Z", "ACCEPT", "as-drafted" }, false);
		give.accept(new Object[] { aId, "2026-06-01T09:01:30Z", "ACCEPT", "as-drafted" }, false);
		give.accept(new Object[] { aId, "2026-06-01T09:02:00Z", "ACCEPT", "as-drafted" }, false);
		give.accept(new Object[] { aId, "2026-06-01T09:30:00Z", "REJECT", "not-a-feature" }, false);
		give.accept(new Object[] { aId, "2026-06-01T09:30:40Z", "REJECT", "not-a-feature" }, false);
		give.accept(new Object[] { aId, "2026-06-02T09:00:00Z", "AMEND", "geometry-adjusted" }, false);
		give.accept(new Object[] { aId, "2026-06-02T09:00:20Z", "AMEND", "geometry-adjusted" }, false);
		give.accept(new Object[] { bId, "2026-06-01T10:00:00Z", "ACCEPT", "as-drafted" }, false);
		give.accept(new Object[] { bId, "2026-06-01T10:00:10Z", "ACCEPT", "as-drafted" }, false);
		give.accept(new Object[] { bId, "2026-06-01T10:00:30Z", "REJECT", "already-mapped" }, false);
		give.accept(new Object[] { bId, "2026-06-01T10:00:40Z", "REJECT", "not-a-feature" }, true);
		give.accept(new Object[] { bId, "2026-06-02T20:00:00Z", "ACCEPT", "as-drafted" }, false);
		// the checks' own flags cleared (each test road stands alone), then a near miss
		// flagged on a's first accepted and first rejected draft
		this.jdbc.update("update draft set flags = null where batch_id = ?", this.batchId);
		for (int i : new int[] { 0, 4 }) {
			this.jdbc.update("update draft set flags = ? where id = ?",
					"[{\"code\":\"near-miss\",\"label\":\"Nearly meets a road\"}]", drafts.get(i)[0]);
		}
		this.jdbc.update("update cell set decided_count = (select count(*) from current_verdict v"
				+ " where v.cell_id = cell.id) where batch_id = ?", this.batchId);
		this.jdbc.update("update cell set finished_at = ? where id = ?", OffsetDateTime.parse("2026-06-02T09:00:20Z"),
				drafts.get(0)[1]);
		this.clock.advance(Duration.between(this.clock.instant(), Instant.parse("2026-06-03T12:00:00Z")));
	}

	@Test
	void throughputPaceAndReasonsAgreeWithTheHandCount() {
		JsonNode view = this.lead.get("/api/batches/" + this.batchId + "/dashboard").json();
		JsonNode tables = view.get("tables");

		// per UTC day: 06-01 a 6 + b 3 = 9; 06-02 a 2 + b 1 = 3; 06-03 none
		Map<String, List<Long>> daily = rows(tables.get("throughput-daily"));
		assertThat(columns(tables.get("throughput-daily"))).containsExactly("day", "team", this.a, this.b);
		assertThat(daily.get("2026-06-01")).containsExactly(9L, 6L, 3L);
		assertThat(daily.get("2026-06-02")).containsExactly(3L, 2L, 1L);
		assertThat(daily.get("2026-06-03")).containsExactly(0L, 0L, 0L);
		assertThat(daily).hasSize(3);

		// the last 24 hours, 06-02T13:00 to 06-03T12:00: only b's 20:00 verdict
		JsonNode hourly = tables.get("throughput-hourly").get("rows");
		assertThat(hourly).hasSize(24);
		assertThat(hourly.get(0).get(0).asString()).isEqualTo("2026-06-02T13:00Z");
		assertThat(hourly.get(7).get(0).asString()).isEqualTo("2026-06-02T20:00Z");
		assertThat(hourly.get(7).get(1).asLong()).isEqualTo(1);
		long sum = 0;
		for (JsonNode row : hourly) {
			sum += row.get(1).asLong();
		}
		assertThat(sum).isEqualTo(1);

		// gaps within 10 minutes, in seconds: a 30, 60, 30, 40 (the 28 min break and the
		// overnight gap left out), 20; sorted 20 30 30 40 60. percentile_cont, linear
		// between ranks: median = rank 2 of 0..4 = 30; p90 at 0.9 * 4 = 3.6: 40 + 0.6 *
		// 20 = 52. b: 10, 20 (the withdrawn verdict is not in the log): median 15, p90 at
		// 0.9: 10 + 0.9 * 10 = 19
		Map<String, JsonNode> pace = new HashMap<>();
		tables.get("pace").get("rows").forEach((r) -> pace.put(r.get(0).asString(), r));
		assertThat(pace.get(this.a).get(1).asLong()).isEqualTo(8);
		assertThat(pace.get(this.a).get(2).asLong()).as("decided today").isZero();
		assertThat(pace.get(this.a).get(3).asDouble()).isCloseTo(30, within(1e-9));
		assertThat(pace.get(this.a).get(4).asDouble()).isCloseTo(52, within(1e-9));
		assertThat(pace.get(this.a).get(5).asLong()).isEqualTo(5);
		assertThat(pace.get(this.b).get(1).asLong()).isEqualTo(4);
		assertThat(pace.get(this.b).get(3).asDouble()).isCloseTo(15, within(1e-9));
		assertThat(pace.get(this.b).get(4).asDouble()).isCloseTo(19, within(1e-9));

		// standing verdicts: ACCEPT as-drafted 4 + 3 = 7, AMEND geometry-adjusted 2,
		// REJECT not-a-feature 2, REJECT already-mapped 1
		Map<String, Long> reasons = new HashMap<>();
		tables.get("reasons")
			.get("rows")
			.forEach((r) -> reasons.put(r.get(0).asString() + " " + r.get(1).asString(), r.get(2).asLong()));
		assertThat(reasons).containsExactlyInAnyOrderEntriesOf(Map.of("ACCEPT as-drafted", 7L,
				"AMEND geometry-adjusted", 2L, "REJECT not-a-feature", 2L, "REJECT already-mapped", 1L));
		List<String> byValidator = new ArrayList<>();
		tables.get("reasons-by-validator")
			.get("rows")
			.forEach((r) -> byValidator.add(r.get(0).asString().substring(0, 1) + " " + r.get(1).asString() + " "
					+ r.get(2).asString() + " " + r.get(3).asLong()));
		assertThat(byValidator).containsExactly("a ACCEPT as-drafted 4", "a AMEND geometry-adjusted 2",
				"a REJECT not-a-feature 2", "b ACCEPT as-drafted 3", "b REJECT already-mapped 1");

		long banded = 0;
		long rejected = 0;
		for (JsonNode band : tables.get("confidence").get("rows")) {
			banded += band.get(2).asLong();
			rejected += band.get(5).asLong();
		}
		assertThat(banded).isEqualTo(12);
		assertThat(rejected).isEqualTo(3);
		assertThat(rows(tables.get("cells-daily")).get("2026-06-02")).containsExactly(1L);

		// by flag: near-miss on 2 drafts (1 accepted, 1 rejected not-a-feature); none on
		// the other 10
		Map<String, JsonNode> flags = new HashMap<>();
		tables.get("flags").get("rows").forEach((r) -> flags.put(r.get(0).asString(), r));
		assertThat(flags.get("near-miss").get(2).asLong()).isEqualTo(2);
		assertThat(flags.get("near-miss").get(3).asLong()).isEqualTo(1);
		assertThat(flags.get("near-miss").get(5).asLong()).isEqualTo(1);
		assertThat(flags.get("near-miss").get(8).asString()).isEqualTo("not-a-feature:1");
		assertThat(flags.get("none").get(2).asLong()).isEqualTo(10);
		assertThat(flags.get("none").get(8).asString()).isEqualTo("already-mapped:1 not-a-feature:1");
	}

	@Test
	void theBurnDownAndTheForecastFollowTheDailyCounts() {
		JsonNode view = this.lead.get("/api/batches/" + this.batchId + "/dashboard").json();
		// 20 drafts; open at the end of 06-01: 20 - 9 = 11, 06-02: 8, 06-03: 8
		Map<String, List<Long>> burndown = rows(view.get("tables").get("burndown"));
		assertThat(burndown.get("2026-06-01")).containsExactly(11L, 9L);
		assertThat(burndown.get("2026-06-02")).containsExactly(8L, 3L);
		assertThat(burndown.get("2026-06-03")).containsExactly(8L, 0L);
		JsonNode progress = view.get("progress");
		assertThat(progress.get("open").asLong()).isEqualTo(8);
		assertThat(progress.get("decided").asLong()).isEqualTo(12);
		// recent days 9, 3, 0: mean 4; squares 25 + 1 + 16 = 42, sd = sqrt(42 / 2) =
		// 4.583; 8 open / 4 a day = 2 days from 06-03T12:00Z; earliest 8 / 8.583 days;
		// mean - sd < 0, so no latest date
		JsonNode forecast = progress.get("forecast");
		assertThat(forecast.get("pacePerDay").asDouble()).isEqualTo(4.0);
		assertThat(forecast.get("paceSd").asDouble()).isCloseTo(Math.sqrt(21), within(0.001));
		assertThat(forecast.get("expected").asString()).isEqualTo("2026-06-05T12:00Z");
		Instant earliest = OffsetDateTime.parse(forecast.get("earliest").asString()).toInstant();
		assertThat(Duration.between(Instant.parse("2026-06-03T12:00:00Z"), earliest).toSeconds())
			.isCloseTo(Math.round(8 / (4 + Math.sqrt(21)) * 86_400), within(1L));
		assertThat(forecast.get("latest").isNull()).isTrue();
	}

	@Test
	void daysAreTheViewersAndTablesComeAsCsvForLeadsOnly() {
		// Asia/Kolkata is UTC+05:30: b's 06-02T20:00Z verdict falls on 06-03 there
		JsonNode tables = this.lead.get("/api/batches/" + this.batchId + "/dashboard?zone=Asia/Kolkata")
			.json()
			.get("tables");
		Map<String, List<Long>> daily = rows(tables.get("throughput-daily"));
		assertThat(daily.get("2026-06-01")).containsExactly(9L, 6L, 3L);
		assertThat(daily.get("2026-06-02")).containsExactly(2L, 2L, 0L);
		assertThat(daily.get("2026-06-03")).containsExactly(1L, 0L, 1L);
		assertThat(tables.get("throughput-hourly").get("rows").get(0).get(0).asString())
			.isEqualTo("2026-06-02T18:00+05:30");

		ApiClient.Response csv = this.lead
			.get("/api/batches/" + this.batchId + "/dashboard/throughput-daily.csv?zone=UTC");
		assertThat(csv.status()).isEqualTo(200);
		assertThat(csv.header("Content-Type")).startsWith("text/csv");
		assertThat(csv.text().split("\r\n")).containsExactly("day,team," + this.a + "," + this.b, "2026-06-01,9,6,3",
				"2026-06-02,3,2,1", "2026-06-03,0,0,0");
		assertThat(this.lead.get("/api/batches/" + this.batchId + "/dashboard/nothing.csv").status()).isEqualTo(404);
		assertThat(this.lead.get("/api/batches/" + this.batchId + "/dashboard?zone=Mars/Olympus").status())
			.isEqualTo(400);
		assertThat(this.validator.get("/api/batches/" + this.batchId + "/dashboard").status()).isEqualTo(403);

		// each cell's log: together the 13 verdicts, the withdrawn one marked
		int events = 0;
		int withdrawn = 0;
		for (Long cellId : this.jdbc.queryForList("select id from cell where batch_id = ?", Long.class, this.batchId)) {
			JsonNode history = this.lead.get("/api/batches/" + this.batchId + "/dashboard/cells/" + cellId + "/history")
				.json();
			for (JsonNode event : history.get("events")) {
				events++;
				withdrawn += event.get("withdrawnAt").isNull() ? 0 : 1;
			}
		}
		assertThat(events).isEqualTo(13);
		assertThat(withdrawn).isEqualTo(1);
		assertThat(this.lead.get("/api/batches/" + this.batchId + "/dashboard/cells/999999/history").status())
			.isEqualTo(404);
	}

	@Test
	void theOverviewAcrossBatchesHoldsThisBatchAndItsValidators() {
		JsonNode overview = this.lead.get("/api/overview?zone=UTC").json();
		JsonNode row = null;
		for (JsonNode batch : overview.get("batches")) {
			if (batch.get("id").asLong() == this.batchId) {
				row = batch;
			}
		}
		assertThat(row).as("the lead's own batch").isNotNull();
		assertThat(row.get("decided").asLong()).isEqualTo(12);
		assertThat(row.get("open").asLong()).isEqualTo(8);
		assertThat(row.get("decidedToday").asLong()).isZero();
		// as the batch's own forecast: days 9, 3, 0, mean 4, 8 open, 2 days
		assertThat(row.get("pacePerDay").asDouble()).isEqualTo(4.0);
		assertThat(row.get("expected").asString()).isEqualTo("2026-06-05T12:00Z");
		JsonNode daily = overview.get("tables").get("daily");
		int column = columns(daily).indexOf("dashboard");
		assertThat(daily.get("rows")).hasSize(14);
		// the last 14 days end on 06-03: 06-01 is the 12th row
		assertThat(daily.get("rows").get(11).get(0).asString()).isEqualTo("2026-06-01");
		assertThat(daily.get("rows").get(11).get(column).asLong()).isEqualTo(9);
		Map<String, List<Long>> validators = rows(overview.get("tables").get("validators"));
		assertThat(validators.get(this.a)).containsExactly(0L, 8L, 8L);
		assertThat(validators.get(this.b)).containsExactly(0L, 4L, 4L);
		assertThat(this.validator.get("/api/overview").status()).isEqualTo(403);
		ApiClient.Response csv = this.lead.get("/api/overview/validators.csv?zone=UTC");
		assertThat(csv.status()).isEqualTo(200);
		assertThat(csv.text()).startsWith("validator,decided_today,decided_last_7_days,decided_last_14_days\r\n")
			.contains(this.a + ",0,8,8\r\n");
	}

	private static List<String> columns(JsonNode table) {
		List<String> names = new ArrayList<>();
		table.get("columns").forEach((c) -> names.add(c.asString()));
		return names;
	}

	/** Rows by their first field, the rest as numbers. */
	private static Map<String, List<Long>> rows(JsonNode table) {
		Map<String, List<Long>> rows = new HashMap<>();
		for (JsonNode row : table.get("rows")) {
			List<Long> values = new ArrayList<>();
			for (int i = 1; i < row.size(); i++) {
				values.add(row.get(i).asLong());
			}
			rows.put(row.get(0).asString(), values);
		}
		return rows;
	}

}
