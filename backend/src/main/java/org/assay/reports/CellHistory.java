package org.assay.reports;

import java.time.OffsetDateTime;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.springframework.http.HttpStatus;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.stereotype.Component;
import org.springframework.web.server.ResponseStatusException;

/**
 * What happened in one cell, for the lead's overview: its drafts by standing verdict and
 * its verdict log, newest first (who, when, which draft, which pass, withdrawn or not),
 * with the moments the cell and its blind second pass were finished.
 */
@Component
class CellHistory {

	static final int EVENTS = 200;

	private final JdbcTemplate jdbc;

	CellHistory(JdbcTemplate jdbc) {
		this.jdbc = jdbc;
	}

	/**
	 * @param batchId the batch the cell must belong to
	 * @param cellId the cell
	 * @return the cell's history
	 */
	Map<String, Object> of(long batchId, long cellId) {
		List<Map<String, Object>> found = this.jdbc
			.query("select c.seq, c.draft_count, c.finished_at, s.opened_at, s.finished_at from cell c"
					+ " left join second_pass s on s.cell_id = c.id where c.id = ? and c.batch_id = ?", (rs, n) -> {
						Map<String, Object> cell = new LinkedHashMap<>();
						cell.put("id", cellId);
						cell.put("seq", rs.getInt(1));
						cell.put("drafts", rs.getInt(2));
						cell.put("finishedAt", instant(rs.getObject(3, OffsetDateTime.class)));
						cell.put("secondPassOpenedAt", instant(rs.getObject(4, OffsetDateTime.class)));
						cell.put("secondPassFinishedAt", instant(rs.getObject(5, OffsetDateTime.class)));
						return cell;
					}, cellId, batchId);
		if (found.isEmpty()) {
			throw new ResponseStatusException(HttpStatus.NOT_FOUND, "No cell " + cellId + " in batch " + batchId);
		}
		Map<String, Object> cell = found.get(0);
		Map<String, Long> standing = new LinkedHashMap<>();
		this.jdbc.query(
				"select verdict, count(*) from current_verdict where cell_id = ? group by verdict order by verdict",
				(org.springframework.jdbc.core.RowCallbackHandler) (rs) -> standing.put(rs.getString(1), rs.getLong(2)),
				cellId);
		cell.put("standing", standing);
		List<Map<String, Object>> events = new ArrayList<>();
		this.jdbc.query(
				"select v.created_at, u.username, d.source_id, d.id, v.verdict, v.reason_code, v.review_pass,"
						+ " w.withdrawn_at, v.comment from verdict v join app_user u on u.id = v.validator_id"
						+ " join draft d on d.id = v.draft_id left join verdict_withdrawal w on w.verdict_id = v.id"
						+ " where v.cell_id = ? order by v.created_at desc, v.id fetch first " + EVENTS + " rows only",
				(org.springframework.jdbc.core.RowCallbackHandler) (rs) -> {
					Map<String, Object> event = new LinkedHashMap<>();
					event.put("at", instant(rs.getObject(1, OffsetDateTime.class)));
					event.put("by", rs.getString(2));
					event.put("sourceId", rs.getString(3));
					event.put("draftId", rs.getLong(4));
					event.put("verdict", rs.getString(5));
					event.put("reasonCode", rs.getString(6));
					int pass = rs.getInt(7);
					event.put("pass", (pass == 0) ? "ruling" : (pass == 2) ? "second" : "first");
					event.put("withdrawnAt", instant(rs.getObject(8, OffsetDateTime.class)));
					event.put("comment", rs.getString(9));
					events.add(event);
				}, cellId);
		cell.put("events", events);
		return cell;
	}

	private static String instant(OffsetDateTime time) {
		return (time != null) ? time.toInstant().toString() : null;
	}

}
