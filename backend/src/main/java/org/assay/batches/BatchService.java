package org.assay.batches;

import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.OffsetDateTime;
import java.util.List;

import org.assay.accounts.Account;
import org.assay.accounts.Role;

import org.springframework.http.HttpStatus;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;
import org.springframework.web.server.ResponseStatusException;

/**
 * Reads batches and decides who may see and run them. A lead runs the batches they
 * uploaded and those an admin assigned to them; an admin runs all; a validator sees the
 * batches open for review.
 */
@Service
@Transactional(readOnly = true)
public class BatchService {

	private static final String SELECT = "select b.id, b.name, b.model_name, b.model_version, b.imagery_url,"
			+ " b.reason_catalogue, b.state, b.created_by, b.created_at, b.lease_minutes, b.draft_count,"
			+ " (select coalesce(sum(c.decided_count), 0) from cell c where c.batch_id = b.id)," + " b.cell_count,"
			+ " (select count(*) from cell c where c.batch_id = b.id and c.finished_at is not null),"
			+ " b.reference_count, b.min_x, b.min_y, b.max_x, b.max_y from batch b";

	private final JdbcTemplate jdbc;

	BatchService(JdbcTemplate jdbc) {
		this.jdbc = jdbc;
	}

	/**
	 * The batches an account may see, newest first.
	 * @param account who asks
	 * @return the batches
	 */
	public List<BatchSummary> visibleTo(Account account) {
		if (account.isAdmin()) {
			return this.jdbc.query(SELECT + " order by b.id desc", BatchService::map);
		}
		if (account.role() == Role.LEAD) {
			return this.jdbc.query(SELECT + " where b.state <> 'CLOSED' or b.created_by = ?"
					+ " or exists (select 1 from batch_lead l where l.batch_id = b.id and l.user_id = ?)"
					+ " order by b.id desc", BatchService::map, account.id(), account.id());
		}
		return this.jdbc.query(SELECT + " where b.state = 'OPEN' order by b.id desc", BatchService::map);
	}

	/**
	 * How many batches are stored.
	 * @return the number of batches
	 */
	public long count() {
		return this.jdbc.queryForObject("select count(*) from batch", Long.class);
	}

	/**
	 * A batch by id.
	 * @param id the batch id
	 * @return the batch
	 * @throws ResponseStatusException 404 when there is no such batch
	 */
	public BatchSummary get(long id) {
		return this.jdbc.query(SELECT + " where b.id = ?", BatchService::map, id)
			.stream()
			.findFirst()
			.orElseThrow(() -> new ResponseStatusException(HttpStatus.NOT_FOUND, "No batch " + id));
	}

	/**
	 * Whether an account runs a batch.
	 * @param account who asks
	 * @param batch the batch
	 * @return true for an admin, the uploading lead and assigned leads
	 */
	public boolean runs(Account account, BatchSummary batch) {
		if (account.isAdmin()) {
			return true;
		}
		if (account.role() != Role.LEAD) {
			return false;
		}
		return batch.createdBy() == account.id()
				|| this.jdbc.queryForObject("select count(*) from batch_lead where batch_id = ? and user_id = ?",
						Integer.class, batch.id(), account.id()) > 0;
	}

	/**
	 * A batch that the account runs.
	 * @param account who asks
	 * @param id the batch id
	 * @return the batch
	 * @throws ResponseStatusException 404 when there is no such batch, 403 when the
	 * account does not run it
	 */
	public BatchSummary requireRun(Account account, long id) {
		BatchSummary batch = get(id);
		if (!runs(account, batch)) {
			throw new ResponseStatusException(HttpStatus.FORBIDDEN, "Only the batch's leads may do this");
		}
		return batch;
	}

	/**
	 * A batch that the account may see.
	 * @param account who asks
	 * @param id the batch id
	 * @return the batch
	 * @throws ResponseStatusException 404 when there is no such batch or the account may
	 * not see it
	 */
	public BatchSummary requireVisible(Account account, long id) {
		BatchSummary batch = get(id);
		if (batch.state() != BatchState.OPEN && !runs(account, batch)) {
			throw new ResponseStatusException(HttpStatus.NOT_FOUND, "No batch " + id);
		}
		return batch;
	}

	private static BatchSummary map(ResultSet rs, int row) throws SQLException {
		return new BatchSummary(rs.getLong(1), rs.getString(2), rs.getString(3), rs.getString(4), rs.getString(5),
				rs.getString(6), BatchState.valueOf(rs.getString(7)), rs.getLong(8),
				rs.getObject(9, OffsetDateTime.class).toInstant(), rs.getInt(10), rs.getInt(11), rs.getLong(12),
				rs.getInt(13), rs.getLong(14), rs.getInt(15),
				new double[] { rs.getDouble(16), rs.getDouble(17), rs.getDouble(18), rs.getDouble(19) });
	}

}
