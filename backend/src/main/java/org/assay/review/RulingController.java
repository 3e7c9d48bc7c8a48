package org.assay.review;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.UUID;

import org.assay.accounts.AccountService;
import org.assay.geo.GeoJsonGeometries;

import org.springframework.http.HttpStatus;
import org.springframework.http.ResponseEntity;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PutMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RestController;

/**
 * The ruling queue of a batch and a lead's rulings.
 */
@RestController
class RulingController {

	private final RulingService rulings;

	private final AccountService accounts;

	RulingController(RulingService rulings, AccountService accounts) {
		this.rulings = rulings;
		this.accounts = accounts;
	}

	/** The drafts of a batch waiting for a ruling, each with both verdicts. */
	@GetMapping("/api/batches/{batchId}/rulings")
	List<Map<String, Object>> open(@PathVariable long batchId) {
		return this.rulings.open(this.accounts.current(), batchId).stream().map(RulingController::view).toList();
	}

	/**
	 * Gives a ruling under a client-chosen id: 201 when stored now, 200 for a retry.
	 */
	@PutMapping("/api/rulings/{id}")
	ResponseEntity<VerdictView> rule(@PathVariable UUID id, @RequestBody VerdictRequest request) {
		VerdictOutcome outcome = this.rulings.rule(this.accounts.current(), id, request);
		return ResponseEntity.status(outcome.repeated() ? HttpStatus.OK : HttpStatus.CREATED)
			.body(VerdictView.of(outcome.verdict(), null));
	}

	private static Map<String, Object> view(RulingService.Case ruling) {
		Map<String, Object> body = new LinkedHashMap<>();
		body.put("draftId", ruling.draftId());
		body.put("cellId", ruling.cellId());
		body.put("cause", ruling.cause());
		body.put("openedAt", ruling.openedAt());
		body.put("kind", ruling.draft().kind().jsonName());
		body.put("confidence", ruling.draft().confidence());
		body.put("sourceId", ruling.draft().sourceId());
		body.put("geometry", GeoJsonGeometries.toMap(ruling.draft().geometry()));
		body.put("first", (ruling.first() != null) ? VerdictView.of(ruling.first(), null) : null);
		body.put("second", (ruling.second() != null) ? VerdictView.of(ruling.second(), null) : null);
		return body;
	}

}
