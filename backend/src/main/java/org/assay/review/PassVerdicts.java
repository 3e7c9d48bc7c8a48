package org.assay.review;

import java.time.ZoneOffset;
import java.util.List;
import java.util.Map;
import java.util.UUID;
import java.util.function.Function;
import java.util.stream.Collectors;

import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.stereotype.Component;

/**
 * The standing verdict of each draft in each review pass ({@code pass_verdict}): 1 the
 * first review, 2 the blind second review, 0 a lead's ruling.
 */
@Component
class PassVerdicts {

	/** The first review. */
	static final int FIRST = 1;

	/** The blind second review. */
	static final int SECOND = 2;

	/** A lead's ruling. */
	static final int RULING = 0;

	private static final String SELECT = "select v.id, v.draft_id, v.cell_id, v.batch_id, v.validator_id, u.username,"
			+ " v.verdict, v.reason_code, v.comment, v.geom, v.supersedes, v.created_at"
			+ " from pass_verdict p join verdict v on v.id = p.verdict_id join app_user u on u.id = v.validator_id";

	private final JdbcTemplate jdbc;

	PassVerdicts(JdbcTemplate jdbc) {
		this.jdbc = jdbc;
	}

	/**
	 * Makes a verdict the standing one of its draft in a pass.
	 * @return true when the draft had none in that pass before
	 */
	boolean put(VerdictRecord record, int pass, double confidence) {
		var at = record.createdAt().atOffset(ZoneOffset.UTC);
		int updated = this.jdbc.update(
				"update pass_verdict set verdict_id = ?, verdict = ?, reason_code = ?, validator_id = ?,"
						+ " decided_at = ? where draft_id = ? and review_pass = ?",
				record.id(), record.verdict().name(), record.reasonCode(), record.validatorId(), at, record.draftId(),
				pass);
		if (updated == 1) {
			return false;
		}
		this.jdbc.update(
				"insert into pass_verdict (draft_id, review_pass, verdict_id, cell_id, batch_id, verdict, reason_code,"
						+ " validator_id, confidence, decided_at) values (?, ?, ?, ?, ?, ?, ?, ?, ?, ?)",
				record.draftId(), pass, record.id(), record.cellId(), record.batchId(), record.verdict().name(),
				record.reasonCode(), record.validatorId(), confidence, at);
		return true;
	}

	/** Leaves a draft without a standing verdict in a pass. */
	void drop(long draftId, int pass) {
		this.jdbc.update("delete from pass_verdict where draft_id = ? and review_pass = ?", draftId, pass);
	}

	/** The standing verdicts of a cell's drafts in a pass, by draft id. */
	Map<Long, VerdictRecord> inCell(long cellId, int pass) {
		return this.jdbc
			.query(SELECT + " where p.cell_id = ? and p.review_pass = ?", VerdictStoreRows::map, cellId, pass)
			.stream()
			.collect(Collectors.toMap(VerdictRecord::draftId, Function.identity()));
	}

	/** The standing verdicts of a draft in every pass, by pass. */
	Map<Integer, VerdictRecord> ofDraft(long draftId) {
		Map<Integer, VerdictRecord> out = new java.util.TreeMap<>();
		this.jdbc.query(SELECT.replace("select v.id", "select p.review_pass, v.id") + " where p.draft_id = ?", (rs) -> {
			out.put(rs.getInt(1), VerdictStoreRows.mapFrom(rs, 2));
		}, draftId);
		return out;
	}

	/** Whether a verdict is a standing one of some pass. */
	boolean stands(UUID verdictId) {
		return !this.jdbc.queryForList("select 1 from pass_verdict where verdict_id = ?", Integer.class, verdictId)
			.isEmpty();
	}

	List<Long> draftsOfCell(long cellId) {
		return this.jdbc.queryForList("select id from draft where cell_id = ? order by seq", Long.class, cellId);
	}

}
