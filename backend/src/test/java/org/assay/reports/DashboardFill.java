package org.assay.reports;

import java.time.Instant;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;

import org.springframework.jdbc.core.JdbcTemplate;

/**
 * Fills a PostgreSQL database in SQL with a reviewed batch for
 * {@link DashboardBenchmark}: drafts 100 to a cell, nine in ten decided, verdicts given
 * by the validators in turn over 30 working days (07:00 to 15:00 UTC, about 17 s apart
 * for each validator), the verdicts of a draft following one another. Ids are worked out
 * from the row numbers (identity columns count up from the first id), so no insert joins
 * a large table.
 */
final class DashboardFill {

	static final int DAYS = 30;

	/** Seconds of work in a day, from 07:00 UTC. */
	private static final int WORKDAY = 8 * 3600;

	private final JdbcTemplate jdbc;

	private final long leadId;

	private final long firstValidator;

	private final int validators;

	private final OffsetDateTime start;

	DashboardFill(JdbcTemplate jdbc, long leadId, int validators, Instant now) {
		this.jdbc = jdbc;
		this.leadId = leadId;
		this.validators = validators;
		this.start = now.atOffset(ZoneOffset.UTC).toLocalDate().minusDays(DAYS).atStartOfDay().atOffset(ZoneOffset.UTC);
		jdbc.update("insert into app_user (username, display_name, password_hash, role, enabled, created_at)"
				+ " select 'bench-v' || lpad(g::text, 3, '0'), 'Validator ' || g, 'x', 'VALIDATOR', true, now()"
				+ " from generate_series(0, ? - 1) g", validators);
		this.firstValidator = jdbc.queryForObject("select min(id) from app_user where username like 'bench-v%'",
				Long.class);
	}

	/**
	 * Fills one batch.
	 * @param name the batch's name
	 * @param drafts how many drafts
	 * @param verdicts how many verdict rows
	 * @return the batch's id
	 */
	long batch(String name, int drafts, int verdicts) {
		int cells = drafts / 100;
		int decided = drafts / 10 * 9;
		long batchId = this.jdbc.queryForObject("insert into batch (name, model_name, model_version,"
				+ " reason_catalogue, state, created_by, created_at, max_drafts_per_cell, max_road_km_per_cell,"
				+ " lease_minutes, draft_count, cell_count, reference_count, min_x, min_y, max_x, max_y)"
				+ " values (?, 'generated', '1', 'standard', 'OPEN', ?, ?, 100, 15, 60, ?, ?, 0, -31.8, 40.8, -29.8,"
				+ " 41.3) returning id", Long.class, name, this.leadId, this.start.minusDays(1), drafts, cells);
		this.jdbc.update("insert into batch_lead (batch_id, user_id) values (?, ?)", batchId, this.leadId);
		long firstCell = insertCells(batchId, cells, decided / 100);
		long firstDraft = insertDrafts(batchId, drafts, firstCell);
		String columns = verdictColumns(batchId, firstDraft, firstCell, decided, verdicts);
		this.jdbc.update("insert into verdict (id, draft_id, cell_id, batch_id, validator_id, verdict, reason_code,"
				+ " created_at, review_pass) select " + columns + " from generate_series(cast(0 as bigint), ? - 1) g",
				verdicts);
		this.jdbc.update("insert into verdict_withdrawal (verdict_id, withdrawn_by, withdrawn_at)"
				+ " select md5(? || '-' || g)::uuid, ?, now() from generate_series(cast(0 as bigint), ? - 1) g"
				+ " where g % 100 = 42 and g + ? < ?", batchId, this.leadId, verdicts, decided, verdicts);
		this.jdbc.update("insert into current_verdict (draft_id, verdict_id, cell_id, batch_id, validator_id, verdict,"
				+ " decided_at) select draft_id, id, cell_id, batch_id, validator_id, verdict, created_at from (select "
				+ columns + " from generate_series(cast(0 as bigint), ? - 1) d,"
				+ " lateral (select d + ? * ((? - 1 - d) / ?) as g) x) v", decided, decided, verdicts, decided);
		this.jdbc.update("insert into second_pass (cell_id, batch_id, first_validator_id, validator_id,"
				+ " decided_count, draft_count, opened_at, finished_at, version) select id, batch_id, ?, ?, 100, 100,"
				+ " finished_at, finished_at + interval '1 hour', 0 from cell where batch_id = ? and second_review"
				+ " and finished_at is not null", this.firstValidator, this.firstValidator + 1, batchId);
		return batchId;
	}

	/** Cells in rows of 100; the first {@code finished} finished one after another. */
	private long insertCells(long batchId, int cells, int finished) {
		this.jdbc.update("insert into cell (batch_id, seq, min_x, min_y, max_x, max_y, draft_count, road_length_m,"
				+ " over_limit, decided_count, holder_id, lease_expires_at, finished_at, second_review, risk, version)"
				+ " select ?, g, -31.8 + (g % 100) * 0.02, 40.8 + (g / 100) * 0.005, -31.78 + (g % 100) * 0.02,"
				+ " 40.805 + (g / 100) * 0.005, 100, 12600, false, case when g < ? then 100 else 0 end,"
				+ " case when g >= ? and g < ? + 50 then ? + g % ? end,"
				+ " case when g >= ? and g < ? + 50 then now() + interval '1 hour' end,"
				+ " case when g < ? then ? + g * (? * interval '1 day') / ? end, g % 10 = 0, (g % 97) / 97.0, 0"
				+ " from generate_series(0, ? - 1) g", batchId, finished, finished, finished, this.firstValidator,
				this.validators, finished, finished, finished, this.start, DAYS, Math.max(finished, 1), cells);
		return first("cell", batchId, cells);
	}

	private long insertDrafts(long batchId, int drafts, long firstCell) {
		this.jdbc.update("insert into draft (batch_id, cell_id, seq, source_id, kind, confidence, feature_class,"
				+ " geom, min_x, min_y, max_x, max_y, length_m, risk, flags)"
				+ " select ?, ? + g / 100, g, 'g-' || g, 'road', 0.3 + (g * 7 % 70) / 100.0, 'residential',"
				+ " '\\x00'::bytea || int4send(2) || int4send(2) || float8send(x) || float8send(y)"
				+ " || float8send(x + 0.001) || float8send(y), x, y, x + 0.001, y, 85, 0.5,"
				+ " case when g % 20 = 0 then '[{\"code\":\"near-miss\"}]'"
				+ " when g % 50 = 1 then '[{\"code\":\"mapped-already\"}]'"
				+ " when g % 97 = 2 then '[{\"code\":\"spike\"},{\"code\":\"short-segment\"}]' end"
				+ " from (select g, -31.8 + (g % 1000) * 0.002 as x, 40.8 + (g / 1000) * 0.0005 as y"
				+ " from generate_series(0, ? - 1) g) p", batchId, firstCell, drafts);
		return first("draft", batchId, drafts);
	}

	/** The first id of a batch's rows, checked to count up with {@code seq}. */
	private long first(String table, long batchId, int rows) {
		Long first = this.jdbc.queryForObject("select min(id) from " + table + " where batch_id = ?", Long.class,
				batchId);
		Long off = this.jdbc.queryForObject("select count(*) from " + table + " where batch_id = ? and id - seq <> ?",
				Long.class, batchId, first);
		if (off != 0) {
			throw new IllegalStateException(off + " rows of " + table + " have ids out of step with seq");
		}
		return first;
	}

	/**
	 * The verdict row {@code g}: draft {@code g % decided}, its {@code g / decided}-th
	 * verdict (the second of a draft in every tenth cell is its blind second review),
	 * validator chosen in turn and shifted by that number so that the two passes differ.
	 */
	private String verdictColumns(long batchId, long firstDraft, long firstCell, int decided, int verdicts) {
		long perDay = (verdicts + DAYS - 1) / DAYS;
		return ("md5('%1$d-' || g)::uuid as id, %2$d + g %% %4$d as draft_id, %3$d + (g %% %4$d) / 100 as cell_id,"
				+ " %1$d as batch_id, %5$d + (g + g / %4$d) %% %6$d as validator_id,"
				+ " case when g * 37 %% 100 < 80 then 'ACCEPT' when g * 37 %% 100 < 87 then 'AMEND'"
				+ " when g * 37 %% 100 < 97 then 'REJECT' else 'ESCALATE' end as verdict,"
				+ " case when g * 37 %% 100 < 80 then 'as-drafted' when g * 37 %% 100 < 84 then 'geometry-adjusted'"
				+ " when g * 37 %% 100 < 87 then 'joined-to-network' when g * 37 %% 100 < 93 then 'not-a-feature'"
				+ " when g * 37 %% 100 < 97 then 'already-mapped' else 'cannot-decide' end as reason_code,"
				+ " timestamptz '%7$s' + (g / %8$d) * interval '1 day'"
				+ " + (25200 + (g %% %8$d) * %9$d.0 / %8$d + g * 7919 %% 13) * interval '1 second' as created_at,"
				+ " case when g / %4$d = 1 and ((g %% %4$d) / 100) %% 10 = 0 then 2 else 1 end as review_pass")
			.formatted(batchId, firstDraft, firstCell, decided, this.firstValidator, this.validators, this.start,
					perDay, WORKDAY);
	}

}
