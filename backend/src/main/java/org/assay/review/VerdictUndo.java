package org.assay.review;

import java.time.Clock;
import java.util.Optional;
import java.util.UUID;

import org.assay.accounts.Account;
import org.assay.batches.Draft;
import org.assay.batches.DraftStore;
import org.assay.queue.CellProgress;
import org.assay.queue.QueueService;

import org.springframework.context.ApplicationEventPublisher;
import org.springframework.http.HttpStatus;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;
import org.springframework.web.server.ResponseStatusException;

/**
 * Takes back a validator's last verdict in a cell. The verdict stays in the log, marked
 * withdrawn; its draft falls back to the verdict it superseded in the same review pass,
 * or to undecided; the pass's progress counts it off, which may open a finished cell
 * again.
 *
 * <p>
 * Only the author may withdraw a verdict, only while they hold the claim on its pass of
 * the cell, and only their latest standing verdict there: undo walks back one's own
 * verdicts in the order they were given. A retried withdrawal changes nothing.
 */
@Service
class VerdictUndo {

	private final VerdictStore store;

	private final PassVerdicts passes;

	private final RulingCases cases;

	private final DraftStore drafts;

	private final QueueService queue;

	private final ApplicationEventPublisher events;

	private final Clock clock;

	VerdictUndo(VerdictStore store, PassVerdicts passes, RulingCases cases, DraftStore drafts, QueueService queue,
			ApplicationEventPublisher events, Clock clock) {
		this.clock = clock;
		this.store = store;
		this.passes = passes;
		this.cases = cases;
		this.drafts = drafts;
		this.queue = queue;
		this.events = events;
	}

	/**
	 * What a withdrawal leaves: the draft's standing verdict in the pass and the
	 * progress.
	 */
	record Outcome(VerdictRecord withdrawn, VerdictRecord restored, CellProgress cell, boolean repeated) {
	}

	@Transactional
	Outcome withdraw(Account account, UUID id) {
		VerdictRecord record = this.store.find(id)
			.orElseThrow(() -> new ResponseStatusException(HttpStatus.NOT_FOUND, "No verdict " + id));
		if (record.validatorId() != account.id()) {
			throw new ResponseStatusException(HttpStatus.FORBIDDEN, "Only its author may take back verdict " + id);
		}
		int pass = this.store.passOf(id);
		if (pass == PassVerdicts.RULING) {
			throw new ResponseStatusException(HttpStatus.CONFLICT, "A ruling cannot be taken back");
		}
		if (this.store.withdrawn(id)) {
			return new Outcome(record, standing(record.draftId(), pass), this.queue.progress(record.cellId()), true);
		}
		this.queue.requireUndoable(account, record.cellId(), pass);
		if (this.store.withdrawn(id)) {
			// the same undo, sent twice at once, waited for the cell's lock behind itself
			return new Outcome(record, standing(record.draftId(), pass), this.queue.progress(record.cellId()), true);
		}
		if (this.cases.ruled(record.draftId())) {
			throw new ResponseStatusException(HttpStatus.CONFLICT,
					"Draft " + record.draftId() + " was ruled by a lead; its verdicts stand");
		}
		VerdictRecord current = standing(record.draftId(), pass);
		if (current == null || !current.id().equals(id)) {
			throw new ResponseStatusException(HttpStatus.CONFLICT,
					"Verdict " + id + " no longer stands: a later verdict replaced it");
		}
		if (!this.store.latestOf(account.id(), record.cellId(), pass).map(id::equals).orElse(false)) {
			throw new ResponseStatusException(HttpStatus.CONFLICT,
					"Only your latest verdict in cell " + record.cellId() + " can be taken back");
		}
		this.store.markWithdrawn(id, account.id(), this.clock.instant());
		Draft draft = this.drafts.find(record.draftId()).orElseThrow();
		VerdictRecord previous = (record.supersedes() != null) ? this.store.find(record.supersedes()).orElse(null)
				: null;
		CellProgress progress = (pass == PassVerdicts.SECOND) ? restoreSecond(account, record, previous, draft)
				: restoreFirst(account, record, previous, draft);
		this.cases.sync(record.cellId());
		this.events.publishEvent(new VerdictWithdrawn(id, record.batchId(), record.cellId(), record.draftId(),
				account.id(), (previous != null) ? previous.id() : null));
		return new Outcome(record, previous, progress, false);
	}

	private CellProgress restoreFirst(Account account, VerdictRecord record, VerdictRecord previous, Draft draft) {
		if (previous != null) {
			this.store.makeCurrent(previous);
			this.passes.put(previous, PassVerdicts.FIRST, draft.confidence());
			return this.queue.countDecision(record.cellId(), 0, account.id());
		}
		this.store.dropCurrent(record.draftId());
		this.passes.drop(record.draftId(), PassVerdicts.FIRST);
		return this.queue.countDecision(record.cellId(), -1, account.id());
	}

	private CellProgress restoreSecond(Account account, VerdictRecord record, VerdictRecord previous, Draft draft) {
		if (previous != null) {
			this.passes.put(previous, PassVerdicts.SECOND, draft.confidence());
			return this.queue.countSecondDecision(record.cellId(), 0, account);
		}
		this.passes.drop(record.draftId(), PassVerdicts.SECOND);
		return this.queue.countSecondDecision(record.cellId(), -1, account);
	}

	private VerdictRecord standing(long draftId, int pass) {
		if (pass == PassVerdicts.SECOND) {
			return this.passes.ofDraft(draftId).get(PassVerdicts.SECOND);
		}
		Optional<UUID> current = this.store.currentId(draftId);
		return current.flatMap(this.store::find).orElse(null);
	}

}
