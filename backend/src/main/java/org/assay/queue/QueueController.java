package org.assay.queue;

import java.util.List;

import org.assay.accounts.AccountService;

import org.springframework.http.ResponseEntity;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RestController;

/**
 * Claim, release and assign cells; list a batch's cells and one's own.
 */
@RestController
class QueueController {

	private final QueueService queue;

	private final AccountService accounts;

	QueueController(QueueService queue, AccountService accounts) {
		this.queue = queue;
		this.accounts = accounts;
	}

	@PostMapping("/api/batches/{batchId}/claims/next")
	ResponseEntity<CellView> claimNext(@PathVariable long batchId) {
		return this.queue.claimNext(this.accounts.current(), batchId)
			.map(ResponseEntity::ok)
			.orElseGet(() -> ResponseEntity.noContent().build());
	}

	@GetMapping("/api/batches/{batchId}/cells")
	List<CellView> cells(@PathVariable long batchId) {
		return this.queue.ofBatch(this.accounts.current(), batchId);
	}

	@GetMapping("/api/my/cells")
	List<CellView> mine() {
		return this.queue.mine(this.accounts.current());
	}

	@GetMapping("/api/cells/{cellId}")
	CellView cell(@PathVariable long cellId) {
		return this.queue.readable(this.accounts.current(), cellId);
	}

	@PostMapping("/api/cells/{cellId}/release")
	ResponseEntity<Void> release(@PathVariable long cellId) {
		this.queue.release(this.accounts.current(), cellId);
		return ResponseEntity.noContent().build();
	}

	@PostMapping("/api/cells/{cellId}/assignment")
	CellView assign(@PathVariable long cellId, @RequestBody Assignment assignment) {
		return this.queue.assign(this.accounts.current(), cellId, assignment.validator());
	}

	record Assignment(String validator) {
	}

}
