package org.assay.review;

import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.Instant;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.UUID;
import java.util.function.Function;
import java.util.stream.Collectors;

import org.assay.geo.Wkb;

import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.stereotype.Component;

/**
 * The verdict log and the current verdict of each draft.
 */
@Component
class VerdictStore {

	private static final String SELECT = "select v.id, v.draft_id, v.cell_id, v.batch_id, v.validator_id, u.username,"
			+ " v.verdict, v.reason_code, v.comment, v.geom, v.supersedes, v.created_at"
			+ " from verdict v join app_user u on u.id = v.validator_id";

	private final JdbcTemplate jdbc;

	VerdictStore(JdbcTemplate jdbc) {
		this.jdbc = jdbc;
	}

	Optional<VerdictRecord> find(UUID id) {
		return this.jdbc.query(SELECT + " where v.id = ?", VerdictStore::map, id).stream().findFirst();
	}

	/**
	 * The current verdicts of a cell's drafts, by draft id.
	 */
	Map<Long, VerdictRecord> currentInCell(long cellId) {
		return this.jdbc
			.query(SELECT + " join current_verdict c on c.verdict_id = v.id where c.cell_id = ?", VerdictStore::map,
					cellId)
			.stream()
			.collect(Collectors.toMap(VerdictRecord::draftId, Function.identity()));
	}

	Optional<UUID> currentId(long draftId) {
		return this.jdbc.queryForList("select verdict_id from current_verdict where draft_id = ?", UUID.class, draftId)
			.stream()
			.findFirst();
	}

	List<VerdictRecord> history(long draftId) {
		return this.jdbc.query(SELECT + " where v.draft_id = ? order by v.created_at", VerdictStore::map, draftId);
	}

	List<VerdictRecord> currentWith(long batchId, Verdict verdict) {
		return this.jdbc.query(
				SELECT + " join current_verdict c on c.verdict_id = v.id"
						+ " where c.batch_id = ? and c.verdict = ? order by v.created_at",
				VerdictStore::map, batchId, verdict.name());
	}

	void insert(VerdictRecord record) {
		insert(record, PassVerdicts.FIRST);
	}

	void insert(VerdictRecord record, int pass) {
		this.jdbc.update(
				"insert into verdict (id, draft_id, cell_id, batch_id, validator_id, verdict, reason_code, comment,"
						+ " geom, supersedes, created_at, review_pass) values (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)",
				record.id(), record.draftId(), record.cellId(), record.batchId(), record.validatorId(),
				record.verdict().name(), record.reasonCode(), record.comment(),
				(record.geometry() != null) ? Wkb.write(record.geometry()) : null, record.supersedes(),
				record.createdAt().atOffset(ZoneOffset.UTC), pass);
	}

	/**
	 * Makes a verdict its draft's current one.
	 * @return true when the draft had no current verdict before
	 */
	boolean makeCurrent(VerdictRecord record) {
		OffsetDateTime at = record.createdAt().atOffset(ZoneOffset.UTC);
		int updated = this.jdbc.update(
				"update current_verdict set verdict_id = ?, verdict = ?, validator_id = ?,"
						+ " decided_at = ? where draft_id = ?",
				record.id(), record.verdict().name(), record.validatorId(), at, record.draftId());
		if (updated == 1) {
			return false;
		}
		this.jdbc.update(
				"insert into current_verdict (draft_id, verdict_id, cell_id, batch_id, verdict, validator_id,"
						+ " decided_at) values (?, ?, ?, ?, ?, ?, ?)",
				record.draftId(), record.id(), record.cellId(), record.batchId(), record.verdict().name(),
				record.validatorId(), at);
		return true;
	}

	/** The review pass a verdict was given in: 1, 2, or 0 for a ruling. */
	int passOf(UUID id) {
		return this.jdbc.queryForObject("select review_pass from verdict where id = ?", Integer.class, id);
	}

	boolean withdrawn(UUID id) {
		return !this.jdbc.queryForList("select 1 from verdict_withdrawal where verdict_id = ?", Integer.class, id)
			.isEmpty();
	}

	/** A validator's latest verdict in a pass of a cell that was not taken back. */
	Optional<UUID> latestOf(long validatorId, long cellId, int pass) {
		return this.jdbc
			.queryForList(
					"select v.id from verdict v where v.cell_id = ? and v.validator_id = ? and v.review_pass = ?"
							+ " and not exists (select 1 from verdict_withdrawal w where w.verdict_id = v.id)"
							+ " order by v.created_at desc fetch first 1 rows only",
					UUID.class, cellId, validatorId, pass)
			.stream()
			.findFirst();
	}

	void markWithdrawn(UUID id, long validatorId, Instant at) {
		this.jdbc.update("insert into verdict_withdrawal (verdict_id, withdrawn_by, withdrawn_at) values (?, ?, ?)", id,
				validatorId, at.atOffset(ZoneOffset.UTC));
	}

	/** Leaves a draft without a current verdict. */
	void dropCurrent(long draftId) {
		this.jdbc.update("delete from current_verdict where draft_id = ?", draftId);
	}

	private static VerdictRecord map(ResultSet rs, int n) throws SQLException {
		return VerdictStoreRows.map(rs, n);
	}

}
