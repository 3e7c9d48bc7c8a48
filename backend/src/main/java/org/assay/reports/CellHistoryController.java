package org.assay.reports;

import java.util.Map;

import org.assay.accounts.AccountService;
import org.assay.batches.BatchService;

import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.RestController;

/**
 * One cell's history ({@link CellHistory}) for the batch's leads and admins.
 */
@RestController
class CellHistoryController {

	private final CellHistory history;

	private final BatchService batches;

	private final AccountService accounts;

	CellHistoryController(CellHistory history, BatchService batches, AccountService accounts) {
		this.history = history;
		this.batches = batches;
		this.accounts = accounts;
	}

	@GetMapping("/api/batches/{id}/dashboard/cells/{cellId}/history")
	Map<String, Object> history(@PathVariable long id, @PathVariable long cellId) {
		this.batches.requireRun(this.accounts.current(), id);
		return this.history.of(id, cellId);
	}

}
