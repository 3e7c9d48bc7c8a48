package org.assay.review;

import java.time.Clock;
import java.util.List;
import java.util.Optional;
import java.util.UUID;

import org.assay.accounts.Account;
import org.assay.batches.BatchService;
import org.assay.batches.BatchSummary;
import org.assay.batches.Draft;
import org.assay.batches.DraftStore;
import org.assay.queue.CellProgress;
import org.assay.queue.CellView;
import org.assay.queue.QueueService;

import org.springframework.context.ApplicationEventPublisher;
import org.springframework.http.HttpStatus;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;
import org.springframework.web.server.ResponseStatusException;

/**
 * Stores verdicts. A verdict is given by the validator holding the draft's cell, checked
 * by {@link VerdictRules}, appended to the log, made the draft's current verdict and
 * counted in the cell's progress, all in one transaction. The client's id makes a retry
 * harmless.
 */
@Service
public class VerdictService {

	private final VerdictStore store;

	private final DraftStore drafts;

	private final BatchService batches;

	private final QueueService queue;

	private final ReasonCatalogue catalogue;

	private final ApplicationEventPublisher events;

	private final Clock clock;

	private final PassVerdicts passes;

	private final RulingCases cases;

	VerdictService(VerdictStore store, PassVerdicts passes, RulingCases cases, DraftStore drafts, BatchService batches,
			QueueService queue, ReasonCatalogue catalogue, ApplicationEventPublisher events, Clock clock) {
		this.store = store;
		this.passes = passes;
		this.cases = cases;
		this.drafts = drafts;
		this.batches = batches;
		this.queue = queue;
		this.catalogue = catalogue;
		this.events = events;
		this.clock = clock;
	}

	/**
	 * Gives a verdict.
	 * @param account the validator
	 * @param id the client-supplied verdict id
	 * @param request the verdict
	 * @return the stored verdict and the cell's progress
	 */
	@Transactional
	public VerdictOutcome give(Account account, UUID id, VerdictRequest request) {
		Optional<VerdictOutcome> repeat = repeated(account, id, request);
		if (repeat.isPresent()) {
			return repeat.get();
		}
		if (request.draftId() == null) {
			throw new VerdictRefused("draftId is required");
		}
		Draft draft = this.drafts.find(request.draftId())
			.orElseThrow(() -> new ResponseStatusException(HttpStatus.NOT_FOUND, "No draft " + request.draftId()));
		CellView held = this.queue.requireHeld(account, draft.cellId());
		if (this.cases.ruled(draft.id())) {
			throw new ResponseStatusException(HttpStatus.CONFLICT,
					"Draft " + draft.id() + " was ruled by a lead; its verdict is final");
		}
		BatchSummary batch = this.batches.get(draft.batchId());
		List<ReasonCode> reasons = this.catalogue.reasons(batch.reasonCatalogue());
		VerdictRules.Checked checked = VerdictRules.check(request, draft.kind(), reasons);
		int pass = (held.pass() == PassVerdicts.SECOND) ? PassVerdicts.SECOND : PassVerdicts.FIRST;
		UUID previous = (pass == PassVerdicts.SECOND)
				? Optional.ofNullable(this.passes.ofDraft(draft.id()).get(PassVerdicts.SECOND))
					.map(VerdictRecord::id)
					.orElse(null)
				: this.store.currentId(draft.id()).orElse(null);
		VerdictRecord record = new VerdictRecord(id, draft.id(), draft.cellId(), draft.batchId(), account.id(),
				account.username(), checked.verdict(), checked.reason().code(), checked.comment(), checked.geometry(),
				previous, this.clock.instant());
		this.store.insert(record, pass);
		CellProgress progress;
		if (pass == PassVerdicts.SECOND) {
			boolean first = this.passes.put(record, PassVerdicts.SECOND, draft.confidence());
			progress = this.queue.countSecondDecision(draft.cellId(), first ? 1 : 0, account);
			// a finished second pass stays with its validator, who may still change a
			// verdict
			if (progress.finished()) {
				this.cases.sync(draft.cellId());
			}
		}
		else {
			boolean first = this.store.makeCurrent(record);
			this.passes.put(record, PassVerdicts.FIRST, draft.confidence());
			progress = this.queue.countDecision(draft.cellId(), first ? 1 : 0, account.id());
			if (progress.finished()) {
				this.cases.sync(draft.cellId());
			}
		}
		this.events.publishEvent(
				new VerdictGiven(id, draft.batchId(), draft.cellId(), draft.id(), account.id(), checked.verdict()));
		return new VerdictOutcome(record, progress, false);
	}

	/**
	 * Answers a retried verdict: the same id from the same validator for the same draft
	 * returns what was stored; any other use of the id is a conflict.
	 */
	@Transactional(readOnly = true)
	public Optional<VerdictOutcome> repeated(Account account, UUID id, VerdictRequest request) {
		return this.store.find(id).map((stored) -> {
			if (stored.validatorId() != account.id()
					|| (request.draftId() != null && stored.draftId() != request.draftId())) {
				throw new ResponseStatusException(HttpStatus.CONFLICT, "Verdict id " + id + " is already used");
			}
			return new VerdictOutcome(stored, this.queue.progress(stored.cellId()), true);
		});
	}

	/**
	 * The current verdicts of a cell's drafts.
	 * @param cellId the cell
	 * @return verdicts by draft id
	 */
	@Transactional(readOnly = true)
	public java.util.Map<Long, VerdictRecord> currentInCell(long cellId) {
		return this.store.currentInCell(cellId);
	}

	/**
	 * The verdicts a validator may see in a cell as they work it: in a blind second pass
	 * only their own, else the current ones.
	 * @param cell the cell as the validator works it
	 * @return verdicts by draft id
	 */
	@Transactional(readOnly = true)
	public java.util.Map<Long, VerdictRecord> shownInCell(CellView cell) {
		return (cell.pass() == PassVerdicts.SECOND) ? this.passes.inCell(cell.id(), PassVerdicts.SECOND)
				: this.store.currentInCell(cell.id());
	}

	/**
	 * The escalated drafts of a batch, waiting for a lead.
	 * @param account a lead of the batch
	 * @param batchId the batch
	 * @return the escalating verdicts, oldest first
	 */
	@Transactional(readOnly = true)
	public List<VerdictRecord> escalations(Account account, long batchId) {
		this.batches.requireRun(account, batchId);
		return this.store.currentWith(batchId, Verdict.ESCALATE);
	}

}
