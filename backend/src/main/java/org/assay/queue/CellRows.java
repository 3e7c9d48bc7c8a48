package org.assay.queue;

import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.Instant;
import java.time.OffsetDateTime;
import java.util.List;
import java.util.Optional;

import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.stereotype.Component;

/**
 * Reads cell rows with the names of their holders.
 */
@Component
class CellRows {

	static final String SELECT = "select c.id, c.batch_id, c.seq, c.min_x, c.min_y, c.max_x, c.max_y, c.draft_count,"
			+ " c.decided_count, c.over_limit, h.username, c.lease_expires_at, a.username, c.finished_at,"
			+ " c.holder_id from cell c left join app_user h on h.id = c.holder_id"
			+ " left join app_user a on a.id = c.assigned_to";

	private final JdbcTemplate jdbc;

	CellRows(JdbcTemplate jdbc) {
		this.jdbc = jdbc;
	}

	/**
	 * A cell row with its raw holder, so that callers can judge the lease.
	 */
	record Row(CellView view, Long holderId, Instant leaseExpiresAt) {

		/**
		 * The view as of a moment: a lapsed claim shows no holder.
		 */
		CellView viewAt(Instant now) {
			if (this.leaseExpiresAt != null && this.leaseExpiresAt.isAfter(now)) {
				return this.view;
			}
			CellView v = this.view;
			return new CellView(v.id(), v.batchId(), v.seq(), v.bbox(), v.draftCount(), v.decidedCount(), v.overLimit(),
					null, null, v.assignedTo(), v.finished(), v.pass());
		}

		boolean heldBy(long accountId, Instant now) {
			return this.holderId != null && this.holderId == accountId && this.leaseExpiresAt != null
					&& this.leaseExpiresAt.isAfter(now);
		}

	}

	Optional<Row> find(long id) {
		return this.jdbc.query(SELECT + " where c.id = ?", CellRows::row, id).stream().findFirst();
	}

	List<Row> query(String where, Object... args) {
		return this.jdbc.query(SELECT + " " + where, CellRows::row, args);
	}

	static Row row(ResultSet rs, int n) throws SQLException {
		OffsetDateTime lease = rs.getObject(12, OffsetDateTime.class);
		Instant leaseExpires = (lease != null) ? lease.toInstant() : null;
		Number holderId = (Number) rs.getObject(15);
		CellView view = new CellView(rs.getLong(1), rs.getLong(2), rs.getInt(3),
				new double[] { rs.getDouble(4), rs.getDouble(5), rs.getDouble(6), rs.getDouble(7) }, rs.getInt(8),
				rs.getInt(9), rs.getBoolean(10), rs.getString(11), leaseExpires, rs.getString(13),
				rs.getObject(14) != null, 1);
		return new Row(view, (holderId != null) ? holderId.longValue() : null, leaseExpires);
	}

}
