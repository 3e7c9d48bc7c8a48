package org.assay.review;

import java.util.List;
import java.util.UUID;

import org.assay.accounts.Account;
import org.assay.accounts.AccountService;
import org.assay.batches.BatchService;
import org.assay.queue.CellProgress;

import org.springframework.dao.DuplicateKeyException;
import org.springframework.http.HttpStatus;
import org.springframework.http.ResponseEntity;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.PutMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RestController;

/**
 * Give verdicts and take them back; read the reason catalogue and the escalations of a
 * batch.
 */
@RestController
class VerdictController {

	private final VerdictService verdicts;

	private final ReasonCatalogue catalogue;

	private final BatchService batches;

	private final AccountService accounts;

	private final VerdictUndo undo;

	VerdictController(VerdictService verdicts, VerdictUndo undo, ReasonCatalogue catalogue, BatchService batches,
			AccountService accounts) {
		this.undo = undo;
		this.verdicts = verdicts;
		this.catalogue = catalogue;
		this.batches = batches;
		this.accounts = accounts;
	}

	/**
	 * Gives a verdict under a client-chosen id: 201 when stored now, 200 when the same id
	 * was stored before (a retry).
	 */
	@PutMapping("/api/verdicts/{id}")
	ResponseEntity<VerdictView> give(@PathVariable UUID id, @RequestBody VerdictRequest request) {
		Account account = this.accounts.current();
		VerdictOutcome outcome;
		try {
			outcome = this.verdicts.give(account, id, request);
		}
		catch (DuplicateKeyException ex) {
			// the same id arrived twice at once; the other request stored it
			outcome = this.verdicts.repeated(account, id, request).orElseThrow(() -> ex);
		}
		return ResponseEntity.status(outcome.repeated() ? HttpStatus.OK : HttpStatus.CREATED)
			.body(VerdictView.of(outcome.verdict(), outcome.cell()));
	}

	/**
	 * Takes back the caller's latest verdict in a cell (undo): 201 when withdrawn now,
	 * 200 when it was withdrawn before (a retry).
	 */
	@PostMapping("/api/verdicts/{id}/withdrawal")
	ResponseEntity<WithdrawalView> withdraw(@PathVariable UUID id) {
		VerdictUndo.Outcome outcome = this.undo.withdraw(this.accounts.current(), id);
		return ResponseEntity.status(outcome.repeated() ? HttpStatus.OK : HttpStatus.CREATED)
			.body(new WithdrawalView(id, outcome.withdrawn().draftId(),
					(outcome.restored() != null) ? VerdictView.of(outcome.restored(), null) : null, outcome.cell()));
	}

	/**
	 * The answer to an undo.
	 *
	 * @param withdrawn the verdict taken back
	 * @param draftId its draft
	 * @param restored the verdict that stands again for the draft in that pass, or
	 * {@code null} when the draft is undecided again
	 * @param cell the pass's progress afterwards
	 */
	record WithdrawalView(UUID withdrawn, long draftId, VerdictView restored, CellProgress cell) {
	}

	@GetMapping("/api/batches/{batchId}/reasons")
	List<ReasonCode> reasons(@PathVariable long batchId) {
		return this.catalogue.reasons(this.batches.requireVisible(this.accounts.current(), batchId).reasonCatalogue())
			.stream()
			.filter((reason) -> !reason.retired())
			.toList();
	}

	@GetMapping("/api/batches/{batchId}/escalations")
	List<VerdictView> escalations(@PathVariable long batchId) {
		return this.verdicts.escalations(this.accounts.current(), batchId)
			.stream()
			.map((record) -> VerdictView.of(record, null))
			.toList();
	}

}
