package org.assay.review;

import java.time.OffsetDateTime;
import java.util.LinkedHashMap;
import java.util.Map;

import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.stereotype.Component;

/**
 * A validator's own counts since a moment, from the standing verdicts of each pass, the
 * withdrawals and the finished cells and second passes.
 */
@Component
class OwnProgress {

	private final JdbcTemplate jdbc;

	OwnProgress(JdbcTemplate jdbc) {
		this.jdbc = jdbc;
	}

	/**
	 * Drafts whose standing verdict of a review pass the validator gave since then, by
	 * verdict: a changed verdict counts once, a withdrawn one not at all.
	 */
	Map<String, Integer> verdicts(long validatorId, OffsetDateTime since) {
		Map<String, Integer> verdicts = new LinkedHashMap<>();
		for (Verdict verdict : Verdict.values()) {
			verdicts.put(verdict.name(), 0);
		}
		this.jdbc.query("select verdict, count(*) from pass_verdict where validator_id = ? and decided_at >= ?"
				+ " and review_pass in (1, 2) group by verdict", (rs) -> {
					verdicts.put(rs.getString(1), rs.getInt(2));
				}, validatorId, since);
		return verdicts;
	}

	int withdrawn(long validatorId, OffsetDateTime since) {
		return count("select count(*) from verdict_withdrawal where withdrawn_by = ? and withdrawn_at >= ?",
				validatorId, since);
	}

	/**
	 * First reviews finished since then holding verdicts of theirs, and second reviews
	 * they finished.
	 */
	int cellsFinished(long validatorId, OffsetDateTime since) {
		return count(
				"select count(*) from cell c where c.finished_at >= ? and exists (select 1 from"
						+ " pass_verdict p where p.cell_id = c.id and p.review_pass = 1 and p.validator_id = ?)",
				since, validatorId)
				+ count("select count(*) from second_pass where validator_id = ? and finished_at >= ?", validatorId,
						since);
	}

	private int count(String sql, Object... args) {
		Integer n = this.jdbc.queryForObject(sql, Integer.class, args);
		return (n != null) ? n : 0;
	}

}
