package org.assay.batches;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.assay.accounts.AccountService;

import org.springframework.http.HttpStatus;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.transaction.annotation.Transactional;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PutMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RestController;
import org.springframework.web.server.ResponseStatusException;

/**
 * A batch's share of cells reviewed twice. A change applies to the cells nobody has
 * touched yet (no claim, no verdict); the cells already under way keep their mark, so
 * that no validator's work changes its kind midway.
 */
@RestController
class SecondReviewController {

	private final AccountService accounts;

	private final BatchService batches;

	private final JdbcTemplate jdbc;

	SecondReviewController(AccountService accounts, BatchService batches, JdbcTemplate jdbc) {
		this.accounts = accounts;
		this.batches = batches;
		this.jdbc = jdbc;
	}

	@GetMapping("/api/batches/{id}/second-review")
	Map<String, Object> get(@PathVariable long id) {
		this.batches.requireVisible(this.accounts.current(), id);
		return view(id);
	}

	/** Sets {@code {"share": 0.2, "seed": 7}} (the seed is optional). */
	@PutMapping("/api/batches/{id}/second-review")
	@Transactional
	Map<String, Object> set(@PathVariable long id, @RequestBody Map<String, Object> body) {
		this.batches.requireRun(this.accounts.current(), id);
		if (!(body.get("share") instanceof Number share) || share.doubleValue() < 0 || share.doubleValue() > 1) {
			throw new ResponseStatusException(HttpStatus.BAD_REQUEST, "share must be a number from 0 to 1");
		}
		Object seedValue = body.get("seed");
		if (seedValue != null && !(seedValue instanceof Number)) {
			throw new ResponseStatusException(HttpStatus.BAD_REQUEST, "seed must be a whole number");
		}
		long seed = (seedValue != null) ? ((Number) seedValue).longValue() : System.nanoTime();
		List<Long> untouched = this.jdbc.queryForList(
				"select id from cell c where batch_id = ? and holder_id is null"
						+ " and decided_count = 0 and finished_at is null"
						+ " and not exists (select 1 from second_pass s where s.cell_id = c.id) order by seq",
				Long.class, id);
		boolean[] chosen = SecondReviewPick.choose(untouched.size(), share.doubleValue(), seed);
		List<Object[]> updates = new java.util.ArrayList<>();
		for (int i = 0; i < chosen.length; i++) {
			updates.add(new Object[] { chosen[i], untouched.get(i) });
		}
		this.jdbc.batchUpdate("update cell set second_review = ? where id = ?", updates);
		this.jdbc.update("update batch set second_share = ?, second_seed = ? where id = ?", share.doubleValue(), seed,
				id);
		Map<String, Object> answer = view(id);
		answer.put("cellsChanged", untouched.size());
		return answer;
	}

	private Map<String, Object> view(long id) {
		Map<String, Object> body = new LinkedHashMap<>();
		this.jdbc.query("select b.second_share, b.second_seed,"
				+ " (select count(*) from cell c where c.batch_id = b.id and c.second_review),"
				+ " (select count(*) from second_pass s where s.batch_id = b.id and s.finished_at is not null)"
				+ " from batch b where b.id = ?", (org.springframework.jdbc.core.RowCallbackHandler) (rs) -> {
					body.put("share", rs.getDouble(1));
					body.put("seed", rs.getLong(2));
					body.put("cellsChosen", rs.getLong(3));
					body.put("cellsReviewedTwice", rs.getLong(4));
				}, id);
		return body;
	}

}
