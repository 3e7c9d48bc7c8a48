package org.assay.queue;

import java.time.Instant;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.time.temporal.ChronoUnit;
import java.util.List;
import java.util.Optional;

import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.stereotype.Component;

/**
 * The second passes of cells chosen for blind second review: opened when a cell's first
 * pass is finished, claimed like cells (a conditional update checked by row count) by a
 * validator who gave none of the cell's first-pass verdicts.
 */
@Component
class SecondPasses {

	private static final String SELECT = "select s.cell_id, s.holder_id, s.lease_expires_at, s.validator_id,"
			+ " s.decided_count, s.finished_at, h.username from second_pass s"
			+ " left join app_user h on h.id = s.holder_id";

	private final JdbcTemplate jdbc;

	SecondPasses(JdbcTemplate jdbc) {
		this.jdbc = jdbc;
	}

	/** A second pass row. */
	record Pass(long cellId, Long holderId, Instant leaseExpiresAt, Long validatorId, int decidedCount,
			boolean finished, String holder) {

		boolean heldBy(long accountId, Instant now) {
			return this.holderId != null && this.holderId == accountId && this.leaseExpiresAt != null
					&& this.leaseExpiresAt.isAfter(now);
		}

		/** The cell as its second validator sees it. */
		CellView view(CellView first, Instant now) {
			boolean live = this.leaseExpiresAt != null && this.leaseExpiresAt.isAfter(now);
			return new CellView(first.id(), first.batchId(), first.seq(), first.bbox(), first.draftCount(),
					this.decidedCount, first.overLimit(), live ? this.holder : null, live ? this.leaseExpiresAt : null,
					null, this.finished, 2);
		}

	}

	Optional<Pass> find(long cellId) {
		return this.jdbc.query(SELECT + " where s.cell_id = ?", (rs, n) -> {
			OffsetDateTime lease = rs.getObject(3, OffsetDateTime.class);
			Number holder = (Number) rs.getObject(2);
			Number validator = (Number) rs.getObject(4);
			return new Pass(rs.getLong(1), (holder != null) ? holder.longValue() : null,
					(lease != null) ? lease.toInstant() : null, (validator != null) ? validator.longValue() : null,
					rs.getInt(5), rs.getObject(6) != null, rs.getString(7));
		}, cellId).stream().findFirst();
	}

	/**
	 * The unfinished second passes an account holds a live claim on, in a batch or all.
	 */
	List<Long> heldBy(long accountId, Long batchId, Instant now) {
		return this.jdbc.queryForList("select cell_id from second_pass where holder_id = ? and lease_expires_at > ?"
				+ " and finished_at is null" + ((batchId != null) ? " and batch_id = " + batchId : "")
				+ " order by cell_id", Long.class, accountId, utc(now));
	}

	/**
	 * Opens the second pass of a cell whose first pass just finished, if the cell was
	 * chosen for second review, or if the validator who finished it has none of their
	 * cells in second review yet in a batch that reviews any share twice (so that every
	 * validator's verdicts are measured).
	 */
	void openIfChosen(long cellId, long batchId, long firstValidatorId, Instant now) {
		Boolean chosen = this.jdbc.queryForObject(
				"select c.second_review or (b.second_share > 0 and not exists"
						+ " (select 1 from second_pass p where p.batch_id = c.batch_id and p.first_validator_id = ?))"
						+ " from cell c join batch b on b.id = c.batch_id where c.id = ?",
				Boolean.class, firstValidatorId, cellId);
		if (!Boolean.TRUE.equals(chosen)) {
			return;
		}
		this.jdbc.update("update cell set second_review = true where id = ?", cellId);
		this.jdbc.update(
				"insert into second_pass (cell_id, batch_id, first_validator_id, decided_count, draft_count,"
						+ " opened_at, version) select id, batch_id, ?, 0, draft_count, ?, 0 from cell c where id = ?"
						+ " and not exists (select 1 from second_pass s where s.cell_id = c.id)",
				firstValidatorId, utc(now), cellId);
	}

	/**
	 * Claims an open second pass in a batch for a validator: never a cell with a
	 * first-pass verdict of theirs; first validators they have not yet been paired with
	 * come first, then the oldest.
	 * @return the cell id, if one was claimed
	 */
	Optional<Long> claim(long accountId, long batchId, int leaseMinutes, Instant now) {
		OffsetDateTime at = utc(now);
		OffsetDateTime expires = utc(now.plus(leaseMinutes, ChronoUnit.MINUTES));
		for (int round = 0; round < 20; round++) {
			List<Long> candidates = this.jdbc.queryForList("select s.cell_id from second_pass s where s.batch_id = ?"
					+ " and s.finished_at is null and (s.holder_id is null or s.lease_expires_at <= ?)"
					+ " and (s.validator_id is null or s.validator_id = ?) and s.first_validator_id <> ?"
					+ " and not exists (select 1 from current_verdict v where v.cell_id = s.cell_id"
					+ " and v.validator_id = ?)" + " order by case when s.validator_id = ? then 0 else 1 end,"
					+ " case when exists (select 1 from second_pass o where o.batch_id = s.batch_id"
					+ " and o.validator_id = ? and o.first_validator_id = s.first_validator_id) then 1 else 0 end,"
					+ " s.opened_at, s.cell_id fetch first 16 rows only", Long.class, batchId, at, accountId, accountId,
					accountId, accountId, accountId);
			if (candidates.isEmpty()) {
				return Optional.empty();
			}
			for (long cellId : candidates) {
				int updated = this.jdbc.update(
						"update second_pass set holder_id = ?, validator_id = ?, lease_expires_at = ?,"
								+ " version = version + 1 where cell_id = ? and finished_at is null"
								+ " and (holder_id is null or lease_expires_at <= ?)"
								+ " and (validator_id is null or validator_id = ?)",
						accountId, accountId, expires, cellId, at, accountId);
				if (updated == 1) {
					return Optional.of(cellId);
				}
			}
		}
		return Optional.empty();
	}

	boolean renew(long cellId, long accountId, int leaseMinutes, Instant now) {
		return this.jdbc.update(
				"update second_pass set lease_expires_at = ?, version = version + 1"
						+ " where cell_id = ? and holder_id = ? and lease_expires_at > ?",
				utc(now.plus(leaseMinutes, ChronoUnit.MINUTES)), cellId, accountId, utc(now)) == 1;
	}

	void release(long cellId) {
		this.jdbc.update("update second_pass set holder_id = null, lease_expires_at = null, version = version + 1"
				+ " where cell_id = ?", cellId);
	}

	/**
	 * Counts a second-pass decision, or with {@code delta} -1 a withdrawn one. Like a
	 * first pass, a finished second pass stays with its holder until the lease lapses or
	 * they release it, so that they can still change or take back a verdict; a withdrawal
	 * below the draft count opens it again.
	 * @return whether the second pass finished with it
	 */
	boolean count(long cellId, int delta, Instant now) {
		if (delta != 0) {
			this.jdbc.update("update second_pass set decided_count = decided_count + ? where cell_id = ?", delta,
					cellId);
		}
		if (delta < 0) {
			this.jdbc.update("update second_pass set finished_at = null"
					+ " where cell_id = ? and finished_at is not null and decided_count < draft_count", cellId);
			return false;
		}
		return this.jdbc.update(
				"update second_pass set finished_at = ?"
						+ " where cell_id = ? and finished_at is null and decided_count >= draft_count",
				utc(now), cellId) == 1;
	}

	/**
	 * Removes the second pass of a cell whose first pass is open again, while nobody has
	 * taken it.
	 * @return whether it was removed
	 */
	boolean dropUntaken(long cellId) {
		return this.jdbc.update(
				"delete from second_pass where cell_id = ? and validator_id is null and holder_id is null",
				cellId) == 1;
	}

	private static OffsetDateTime utc(Instant instant) {
		return instant.atOffset(ZoneOffset.UTC);
	}

}
