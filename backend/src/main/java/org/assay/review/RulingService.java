package org.assay.review;

import java.time.Clock;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.UUID;

import org.assay.accounts.Account;
import org.assay.batches.BatchService;
import org.assay.batches.BatchSummary;
import org.assay.batches.Draft;
import org.assay.batches.DraftStore;

import org.springframework.context.ApplicationEventPublisher;
import org.springframework.http.HttpStatus;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;
import org.springframework.web.server.ResponseStatusException;

/**
 * The ruling queue: drafts whose two reviews disagree or that were escalated, and the
 * lead's final verdict on them. A ruling is a verdict like any other (append-only, with
 * its reason), stored as review pass 0 and made the draft's current verdict.
 */
@Service
public class RulingService {

	private final JdbcTemplate jdbc;

	private final VerdictStore store;

	private final PassVerdicts passes;

	private final DraftStore drafts;

	private final BatchService batches;

	private final ReasonCatalogue catalogue;

	private final ApplicationEventPublisher events;

	private final Clock clock;

	RulingService(JdbcTemplate jdbc, VerdictStore store, PassVerdicts passes, DraftStore drafts, BatchService batches,
			ReasonCatalogue catalogue, ApplicationEventPublisher events, Clock clock) {
		this.jdbc = jdbc;
		this.store = store;
		this.passes = passes;
		this.drafts = drafts;
		this.batches = batches;
		this.catalogue = catalogue;
		this.events = events;
		this.clock = clock;
	}

	/** A draft waiting for a ruling, with the verdicts of both passes. */
	record Case(long draftId, long cellId, String cause, Instant openedAt, Draft draft, VerdictRecord first,
			VerdictRecord second) {
	}

	/**
	 * The open cases of a batch, oldest first.
	 * @param account a lead of the batch
	 * @param batchId the batch
	 * @return the cases
	 */
	@Transactional(readOnly = true)
	public List<Case> open(Account account, long batchId) {
		this.batches.requireRun(account, batchId);
		List<Case> cases = new ArrayList<>();
		for (Map<String, Object> row : this.jdbc.queryForList(
				"select draft_id, cell_id, cause, opened_at"
						+ " from ruling_case where batch_id = ? and ruled_at is null order by opened_at, draft_id",
				batchId)) {
			long draftId = ((Number) row.get("draft_id")).longValue();
			Map<Integer, VerdictRecord> byPass = this.passes.ofDraft(draftId);
			cases.add(new Case(draftId, ((Number) row.get("cell_id")).longValue(), (String) row.get("cause"),
					instant(row.get("opened_at")), this.drafts.find(draftId).orElseThrow(),
					byPass.get(PassVerdicts.FIRST), byPass.get(PassVerdicts.SECOND)));
		}
		return cases;
	}

	/**
	 * Gives a lead's ruling on a draft in the ruling queue.
	 * @param account a lead of the draft's batch
	 * @param id the client-supplied verdict id (a retry with it stores nothing new)
	 * @param request the final verdict with its reason
	 * @return the ruling, and whether it was a retry
	 */
	@Transactional
	public VerdictOutcome rule(Account account, UUID id, VerdictRequest request) {
		var stored = this.store.find(id);
		if (stored.isPresent()) {
			if (stored.get().validatorId() != account.id()
					|| (request.draftId() != null && stored.get().draftId() != request.draftId())) {
				throw new ResponseStatusException(HttpStatus.CONFLICT, "Verdict id " + id + " is already used");
			}
			return new VerdictOutcome(stored.get(), null, true);
		}
		if (request.draftId() == null) {
			throw new VerdictRefused("draftId is required");
		}
		Draft draft = this.drafts.find(request.draftId())
			.orElseThrow(() -> new ResponseStatusException(HttpStatus.NOT_FOUND, "No draft " + request.draftId()));
		BatchSummary batch = this.batches.requireRun(account, draft.batchId());
		int open = this.jdbc.update(
				"update ruling_case set ruled_at = ?, ruling_id = ? where draft_id = ?" + " and ruled_at is null",
				this.clock.instant().atOffset(java.time.ZoneOffset.UTC), id, draft.id());
		if (open != 1) {
			throw new ResponseStatusException(HttpStatus.CONFLICT,
					"Draft " + draft.id() + " is not waiting for a ruling");
		}
		VerdictRules.Checked checked = VerdictRules.check(request, draft.kind(),
				this.catalogue.reasons(batch.reasonCatalogue()));
		VerdictRecord record = new VerdictRecord(id, draft.id(), draft.cellId(), draft.batchId(), account.id(),
				account.username(), checked.verdict(), checked.reason().code(), checked.comment(), checked.geometry(),
				this.store.currentId(draft.id()).orElse(null), this.clock.instant());
		this.store.insert(record, PassVerdicts.RULING);
		this.store.makeCurrent(record);
		this.passes.put(record, PassVerdicts.RULING, draft.confidence());
		this.events.publishEvent(
				new VerdictGiven(id, draft.batchId(), draft.cellId(), draft.id(), account.id(), checked.verdict()));
		return new VerdictOutcome(record, null, false);
	}

	private static Instant instant(Object value) {
		if (value instanceof java.time.OffsetDateTime time) {
			return time.toInstant();
		}
		if (value instanceof java.sql.Timestamp time) {
			return time.toInstant();
		}
		return (value instanceof Instant time) ? time : null;
	}

}
