package org.assay.review;

import java.time.Clock;
import java.time.ZoneOffset;
import java.util.List;
import java.util.Map;

import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.stereotype.Component;

/**
 * Keeps the ruling queue of a cell in step with its verdicts. A draft needs a lead's
 * ruling when its cell was reviewed twice, both passes are in and they disagree or one
 * escalated; or when its cell was reviewed once, the pass is finished and the verdict is
 * ESCALATE. A ruled draft stays ruled.
 */
@Component
class RulingCases {

	/** The two verdicts differ. */
	static final String DISAGREEMENT = "disagreement";

	/** A validator escalated (and, with two passes, both said so). */
	static final String ESCALATION = "escalation";

	private final JdbcTemplate jdbc;

	private final Clock clock;

	RulingCases(JdbcTemplate jdbc, Clock clock) {
		this.jdbc = jdbc;
		this.clock = clock;
	}

	/**
	 * Opens the cases a cell needs and withdraws the open ones it no longer needs.
	 * @param cellId the cell
	 * @return the number of open cases of the cell afterwards
	 */
	int sync(long cellId) {
		Map<String, Object> cell = this.jdbc
			.queryForMap("select c.batch_id, c.second_review," + " c.finished_at is not null as first_done,"
					+ " (select s.finished_at from second_pass s where s.cell_id = c.id) as second_done"
					+ " from cell c where c.id = ?", cellId);
		long batchId = ((Number) cell.get("batch_id")).longValue();
		boolean twice = Boolean.TRUE.equals(cell.get("second_review"));
		boolean firstDone = Boolean.TRUE.equals(cell.get("first_done"));
		boolean secondDone = cell.get("second_done") != null;
		List<Map<String, Object>> drafts = this.jdbc.queryForList("select d.id,"
				+ " (select p.verdict from pass_verdict p where p.draft_id = d.id and p.review_pass = 1) as first_verdict,"
				+ " (select p.verdict from pass_verdict p where p.draft_id = d.id and p.review_pass = 2) as second_verdict,"
				+ " r.ruled_at, r.draft_id as open_case from draft d"
				+ " left join ruling_case r on r.draft_id = d.id where d.cell_id = ?", cellId);
		var now = this.clock.instant().atOffset(ZoneOffset.UTC);
		for (Map<String, Object> draft : drafts) {
			if (draft.get("ruled_at") != null) {
				continue;
			}
			long draftId = ((Number) draft.get("id")).longValue();
			String cause = cause(twice, firstDone, secondDone, (String) draft.get("first_verdict"),
					(String) draft.get("second_verdict"));
			boolean open = draft.get("open_case") != null;
			if (cause != null && !open) {
				this.jdbc.update("insert into ruling_case (draft_id, batch_id, cell_id, cause, opened_at)"
						+ " values (?, ?, ?, ?, ?)", draftId, batchId, cellId, cause, now);
			}
			else if (cause != null) {
				this.jdbc.update("update ruling_case set cause = ? where draft_id = ?", cause, draftId);
			}
			else if (open) {
				this.jdbc.update("delete from ruling_case where draft_id = ? and ruled_at is null", draftId);
			}
		}
		return this.jdbc.queryForObject("select count(*) from ruling_case where cell_id = ? and ruled_at is null",
				Integer.class, cellId);
	}

	/** Why a draft needs a ruling, or {@code null}. */
	static String cause(boolean twice, boolean firstDone, boolean secondDone, String first, String second) {
		String escalate = Verdict.ESCALATE.name();
		if (twice) {
			if (!secondDone || first == null || second == null) {
				return null;
			}
			if (!first.equals(second)) {
				return DISAGREEMENT;
			}
			return escalate.equals(first) ? ESCALATION : null;
		}
		return (firstDone && escalate.equals(first)) ? ESCALATION : null;
	}

	boolean ruled(long draftId) {
		return !this.jdbc
			.queryForList("select 1 from ruling_case where draft_id = ? and ruled_at is not null", Integer.class,
					draftId)
			.isEmpty();
	}

}
