package org.assay.queue;

import java.time.Clock;
import java.time.Instant;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.time.temporal.ChronoUnit;
import java.util.List;
import java.util.Optional;

import org.assay.accounts.Account;
import org.assay.accounts.AccountService;
import org.assay.batches.BatchService;
import org.assay.batches.BatchState;
import org.assay.batches.BatchSummary;

import org.springframework.context.ApplicationEventPublisher;
import org.springframework.http.HttpStatus;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;
import org.springframework.web.server.ResponseStatusException;

/**
 * Hands out cells as leases and keeps their progress.
 *
 * <p>
 * A claim is the holder and lease expiry on the cell row. Taking a cell is one
 * conditional update, checked by its row count, which is atomic on H2 and PostgreSQL
 * alike and with any number of server instances: of two validators racing for a cell, one
 * update matches and the other matches nothing and moves on to the next candidate.
 */
@Service
public class QueueService {

	private static final int CANDIDATES = 16;

	private final JdbcTemplate jdbc;

	private final CellRows cells;

	private final BatchService batches;

	private final AccountService accounts;

	private final ApplicationEventPublisher events;

	private final Clock clock;

	private final SecondPasses second;

	QueueService(JdbcTemplate jdbc, CellRows cells, SecondPasses second, BatchService batches, AccountService accounts,
			ApplicationEventPublisher events, Clock clock) {
		this.jdbc = jdbc;
		this.second = second;
		this.cells = cells;
		this.batches = batches;
		this.accounts = accounts;
		this.events = events;
		this.clock = clock;
	}

	/**
	 * Gives a validator their next cell in a batch: the unfinished cell they already
	 * hold, else a cell assigned to them, else the next free cell in the batch's order.
	 * @param account the validator
	 * @param batchId the batch
	 * @return the claimed cell, or empty when no free cell is left
	 */
	@Transactional
	public Optional<CellView> claimNext(Account account, long batchId) {
		BatchSummary batch = this.batches.requireVisible(account, batchId);
		if (batch.state() != BatchState.OPEN) {
			throw new ResponseStatusException(HttpStatus.CONFLICT, "Batch " + batchId + " is " + batch.state());
		}
		Instant now = this.clock.instant();
		OffsetDateTime at = utc(now);
		List<CellRows.Row> held = this.cells.query("where c.batch_id = ? and c.holder_id = ? and c.lease_expires_at > ?"
				+ " and c.finished_at is null order by c.seq", batchId, account.id(), at);
		if (!held.isEmpty()) {
			return Optional.of(renew(held.get(0).view().id(), account, batch.leaseMinutes()));
		}
		List<Long> heldSecond = this.second.heldBy(account.id(), batchId, now);
		if (!heldSecond.isEmpty()) {
			return Optional.of(renew(heldSecond.get(0), account, batch.leaseMinutes()));
		}
		Integer assigned = this.jdbc.queryForObject(
				"select count(*) from cell where batch_id = ? and assigned_to = ?"
						+ " and finished_at is null and (holder_id is null or lease_expires_at <= ?)",
				Integer.class, batchId, account.id(), at);
		if (assigned == 0) {
			Optional<Long> secondPass = this.second.claim(account.id(), batchId, batch.leaseMinutes(), now);
			if (secondPass.isPresent()) {
				return Optional.of(viewFor(account, secondPass.get()));
			}
		}
		OffsetDateTime expires = utc(now.plus(batch.leaseMinutes(), ChronoUnit.MINUTES));
		for (int round = 0; round < 20; round++) {
			List<Long> candidates = this.jdbc.queryForList("select id from cell where batch_id = ?"
					+ " and finished_at is null and (holder_id is null or lease_expires_at <= ?)"
					+ " and (assigned_to is null or assigned_to = ?)"
					+ " order by case when assigned_to = ? then 0 else 1 end, queue_rank, seq fetch first " + CANDIDATES
					+ " rows only", Long.class, batchId, at, account.id(), account.id());
			if (candidates.isEmpty()) {
				return Optional.empty();
			}
			for (long id : candidates) {
				int updated = this.jdbc
					.update("update cell set holder_id = ?, lease_expires_at = ?, version = version + 1"
							+ " where id = ? and finished_at is null and (holder_id is null or lease_expires_at <= ?)",
							account.id(), expires, id, at);
				if (updated == 1) {
					return Optional.of(view(id));
				}
			}
		}
		throw new ResponseStatusException(HttpStatus.SERVICE_UNAVAILABLE, "Too many validators at once; try again");
	}

	/**
	 * Ends a validator's claim on a cell. Verdicts already given are kept.
	 * @param account the holder (or a lead of the batch)
	 * @param cellId the cell
	 */
	@Transactional
	public void release(Account account, long cellId) {
		CellRows.Row row = row(cellId);
		BatchSummary batch = this.batches.get(row.view().batchId());
		Optional<SecondPasses.Pass> pass = this.second.find(cellId);
		if (pass.isPresent() && pass.get().heldBy(account.id(), this.clock.instant())) {
			this.second.release(cellId);
			return;
		}
		if (!row.heldBy(account.id(), this.clock.instant()) && !this.batches.runs(account, batch)) {
			throw new ResponseStatusException(HttpStatus.FORBIDDEN, "You do not hold cell " + cellId);
		}
		this.jdbc.update(
				"update cell set holder_id = null, lease_expires_at = null, version = version + 1" + " where id = ?",
				cellId);
	}

	/**
	 * Assigns a cell to a named validator (a lead's act); it is handed to them first.
	 * @param lead the lead
	 * @param cellId the cell
	 * @param username the validator, or {@code null} to clear the assignment
	 * @return the cell
	 */
	@Transactional
	public CellView assign(Account lead, long cellId, String username) {
		CellRows.Row row = row(cellId);
		this.batches.requireRun(lead, row.view().batchId());
		Long userId = null;
		if (username != null) {
			userId = this.accounts.findByUsername(username)
				.orElseThrow(() -> new ResponseStatusException(HttpStatus.BAD_REQUEST, "No account " + username))
				.id();
		}
		this.jdbc.update("update cell set assigned_to = ?, version = version + 1 where id = ?", userId, cellId);
		return view(cellId);
	}

	/**
	 * The unfinished cells an account holds a live claim on or is assigned to.
	 * @param account who asks
	 * @return the cells
	 */
	@Transactional(readOnly = true)
	public List<CellView> mine(Account account) {
		Instant now = this.clock.instant();
		List<CellView> mine = new java.util.ArrayList<>(this.cells
			.query("where ((c.holder_id = ? and c.lease_expires_at > ?) or c.assigned_to = ?)"
					+ " and c.finished_at is null order by c.batch_id, c.seq", account.id(), utc(now), account.id())
			.stream()
			.map((row) -> row.viewAt(now))
			.toList());
		for (long cellId : this.second.heldBy(account.id(), null, now)) {
			mine.add(viewFor(account, cellId));
		}
		return mine;
	}

	/**
	 * All cells of a batch (a lead's view).
	 * @param account a lead of the batch
	 * @param batchId the batch
	 * @return the cells in sweep order
	 */
	@Transactional(readOnly = true)
	public List<CellView> ofBatch(Account account, long batchId) {
		this.batches.requireRun(account, batchId);
		Instant now = this.clock.instant();
		return this.cells.query("where c.batch_id = ? order by c.seq", batchId)
			.stream()
			.map((row) -> row.viewAt(now))
			.toList();
	}

	/**
	 * A cell that the account may read: one they hold, or one of a batch they run.
	 * @param account who asks
	 * @param cellId the cell
	 * @return the cell
	 */
	@Transactional(readOnly = true)
	public CellView readable(Account account, long cellId) {
		CellRows.Row row = row(cellId);
		Instant now = this.clock.instant();
		Optional<SecondPasses.Pass> pass = this.second.find(cellId);
		if (pass.isPresent() && pass.get().validatorId() != null && pass.get().validatorId() == account.id()) {
			return pass.get().view(row.view(), now);
		}
		boolean assigned = account.username().equals(row.view().assignedTo());
		if (!row.heldBy(account.id(), now) && !assigned
				&& !this.batches.runs(account, this.batches.get(row.view().batchId()))) {
			throw new ResponseStatusException(HttpStatus.FORBIDDEN, "Cell " + cellId + " is not yours");
		}
		return row.viewAt(now);
	}

	/**
	 * Checks that an account holds a live claim on a cell, renews the lease, and locks
	 * the cell row for the rest of the caller's transaction, so that decisions on one
	 * cell are counted one at a time.
	 * @param account the validator
	 * @param cellId the cell
	 * @return the cell
	 * @throws ResponseStatusException 409 when the account holds no live claim on it
	 */
	@Transactional
	public CellView requireHeld(Account account, long cellId) {
		CellRows.Row row = row(cellId);
		BatchSummary batch = this.batches.get(row.view().batchId());
		if (batch.state() != BatchState.OPEN) {
			throw new ResponseStatusException(HttpStatus.CONFLICT, "Batch " + batch.id() + " is " + batch.state());
		}
		return renew(cellId, account, batch.leaseMinutes());
	}

	/**
	 * Checks that an account may take back one of its verdicts of a review pass of a
	 * cell: it holds a live claim on that pass (renewed and locked as by
	 * {@link #requireHeld}), and for the first pass, the cell's second review has not
	 * been taken by anyone.
	 * @param account the validator
	 * @param cellId the cell
	 * @param pass the verdict's review pass, 1 or 2
	 * @return the cell as the validator works it
	 * @throws ResponseStatusException 409 when the verdict can no longer be taken back
	 */
	@Transactional
	public CellView requireUndoable(Account account, long cellId, int pass) {
		CellView held = requireHeld(account, cellId);
		if (held.pass() != pass) {
			throw new ResponseStatusException(HttpStatus.CONFLICT,
					"Your claim on cell " + cellId + " is for review pass " + held.pass() + ", not " + pass);
		}
		if (pass == 1 && held.finished()
				&& this.second.find(cellId).map((p) -> p.validatorId() != null).orElse(false)) {
			throw new ResponseStatusException(HttpStatus.CONFLICT,
					"The second review of cell " + cellId + " has begun; its first-review verdicts stand");
		}
		return held;
	}

	/**
	 * Counts a change in a cell's decided drafts; marks the cell finished when every
	 * draft has a verdict, and publishes {@link CellFinished} then. Call inside the
	 * transaction that stored the verdict, after {@link #requireHeld}.
	 * @param cellId the cell
	 * @param delta +1 for a first decision on a draft, 0 for a changed one, -1 for a
	 * withdrawn decision that leaves the draft undecided
	 * @param validatorId who decided
	 * @return the cell's progress
	 */
	@Transactional
	public CellProgress countDecision(long cellId, int delta, long validatorId) {
		if (delta != 0) {
			this.jdbc.update("update cell set decided_count = decided_count + ? where id = ?", delta, cellId);
		}
		CellView cell = view(cellId);
		boolean complete = cell.decidedCount() >= cell.draftCount();
		boolean finishedNow = false;
		if (complete && !cell.finished()) {
			finishedNow = this.jdbc.update("update cell set finished_at = ? where id = ? and finished_at is null",
					utc(this.clock.instant()), cellId) == 1;
			if (finishedNow) {
				this.second.openIfChosen(cellId, cell.batchId(), validatorId, this.clock.instant());
				this.events.publishEvent(new CellFinished(cell.batchId(), cellId, validatorId));
			}
		}
		else if (!complete && cell.finished()) {
			// a withdrawn verdict opened the cell again: its holder keeps it, and a
			// second pass that nobody has taken waits until it is finished again
			this.jdbc.update("update cell set finished_at = null where id = ?", cellId);
			this.second.dropUntaken(cellId);
		}
		return new CellProgress(cellId, cell.decidedCount(), cell.draftCount(), complete, finishedNow);
	}

	/**
	 * A cell's progress as it stands.
	 * @param cellId the cell
	 * @return its progress
	 */
	@Transactional(readOnly = true)
	public CellProgress progress(long cellId) {
		CellView cell = view(cellId);
		return new CellProgress(cellId, cell.decidedCount(), cell.draftCount(), cell.finished(), false);
	}

	private CellView renew(long cellId, Account account, int leaseMinutes) {
		Instant now = this.clock.instant();
		if (this.second.renew(cellId, account.id(), leaseMinutes, now)) {
			return viewFor(account, cellId);
		}
		int updated = this.jdbc.update(
				"update cell set lease_expires_at = ?, version = version + 1"
						+ " where id = ? and holder_id = ? and lease_expires_at > ?",
				utc(now.plus(leaseMinutes, ChronoUnit.MINUTES)), cellId, account.id(), utc(now));
		if (updated != 1) {
			throw new ResponseStatusException(HttpStatus.CONFLICT,
					"You hold no live claim on cell " + cellId + "; take it again");
		}
		return view(cellId);
	}

	/**
	 * Counts a change in the second pass of a cell; call after {@link #requireHeld} gave
	 * pass 2, in the verdict's transaction.
	 * @param cellId the cell
	 * @param delta +1 for a first second-pass decision on a draft, 0 for a changed one,
	 * -1 for a withdrawn one that leaves the draft undecided
	 * @param account the second validator
	 * @return the second pass's progress; {@code finishedNow} when this decision ended it
	 */
	@Transactional
	public CellProgress countSecondDecision(long cellId, int delta, Account account) {
		boolean finishedNow = this.second.count(cellId, delta, this.clock.instant());
		CellView cell = viewFor(account, cellId);
		return new CellProgress(cellId, cell.decidedCount(), cell.draftCount(), cell.finished(), finishedNow);
	}

	/**
	 * The cell as an account works it: the second pass for its second validator, else the
	 * cell.
	 * @param account who asks
	 * @param cellId the cell
	 * @return the view
	 */
	CellView viewFor(Account account, long cellId) {
		CellRows.Row row = row(cellId);
		Instant now = this.clock.instant();
		Optional<SecondPasses.Pass> pass = this.second.find(cellId);
		if (pass.isPresent() && pass.get().validatorId() != null && pass.get().validatorId() == account.id()) {
			return pass.get().view(row.view(), now);
		}
		return row.viewAt(now);
	}

	private CellView view(long cellId) {
		return row(cellId).viewAt(this.clock.instant());
	}

	private CellRows.Row row(long cellId) {
		return this.cells.find(cellId)
			.orElseThrow(() -> new ResponseStatusException(HttpStatus.NOT_FOUND, "No cell " + cellId));
	}

	private static OffsetDateTime utc(Instant instant) {
		return instant.atOffset(ZoneOffset.UTC);
	}

}
