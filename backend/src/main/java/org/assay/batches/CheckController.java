package org.assay.batches;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.assay.accounts.AccountService;
import org.assay.checks.CheckSettings;
import org.assay.checks.FlagKind;
import org.assay.checks.RiskScore;
import tools.jackson.databind.ObjectMapper;

import org.springframework.http.HttpStatus;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.jdbc.core.RowCallbackHandler;
import org.springframework.transaction.annotation.Transactional;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PutMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RestController;
import org.springframework.web.server.ResponseStatusException;

/**
 * The automated checks as the API shows them: the kinds of flag with their weights and
 * the risk formula, a batch's check settings and flag summary, and its queue order.
 */
@RestController
class CheckController {

	private final AccountService accounts;

	private final BatchService batches;

	private final JdbcTemplate jdbc;

	private final CheckSettingsJson settingsJson;

	private final ObjectMapper json;

	CheckController(AccountService accounts, BatchService batches, JdbcTemplate jdbc, ObjectMapper json) {
		this.accounts = accounts;
		this.batches = batches;
		this.jdbc = jdbc;
		this.json = json;
		this.settingsJson = new CheckSettingsJson(json);
	}

	/** The kinds of flag, the risk formula, the default settings and the queue orders. */
	@GetMapping("/api/checks")
	Map<String, Object> checks() {
		Map<String, Object> body = new LinkedHashMap<>();
		body.put("riskFormula", RiskScore.FORMULA);
		body.put("flags", Arrays.stream(FlagKind.values()).map(CheckController::kind).toList());
		body.put("defaults", CheckSettings.DEFAULTS);
		body.put("queueOrders", Arrays.stream(QueueOrder.values()).map(QueueOrder::apiName).toList());
		return body;
	}

	/** How many drafts carry each kind of flag, with the batch's settings. */
	@GetMapping("/api/batches/{id}/flags")
	Map<String, Object> summary(@PathVariable long id) {
		this.batches.requireVisible(this.accounts.current(), id);
		Map<String, Integer> found = new LinkedHashMap<>();
		this.jdbc.query("select code, drafts from batch_flag_count where batch_id = ?",
				(RowCallbackHandler) (rs) -> found.put(rs.getString(1), rs.getInt(2)), id);
		List<Map<String, Object>> counts = new ArrayList<>();
		for (FlagKind kind : FlagKind.values()) {
			Map<String, Object> row = kind(kind);
			row.put("drafts", found.getOrDefault(kind.code(), 0));
			counts.add(row);
		}
		Map<String, Object> body = new LinkedHashMap<>();
		body.put("batchId", id);
		body.put("flagged", this.jdbc
			.queryForObject("select count(*) from draft where batch_id = ? and flags is not null", Long.class, id));
		body.put("counts", counts);
		body.put("settings", storedSettings(id));
		body.put("riskFormula", RiskScore.FORMULA);
		body.putAll(queueOrder(id));
		return body;
	}

	/** The batch's queue order. */
	@GetMapping("/api/batches/{id}/queue-order")
	Map<String, Object> order(@PathVariable long id) {
		this.batches.requireVisible(this.accounts.current(), id);
		return queueOrder(id);
	}

	/**
	 * Changes the order in which open cells are handed out: {@code {"order": "sweep"}},
	 * and for {@code random} optionally a {@code seed}.
	 */
	@PutMapping("/api/batches/{id}/queue-order")
	@Transactional
	Map<String, Object> reorder(@PathVariable long id, @RequestBody Map<String, Object> body) {
		this.batches.requireRun(this.accounts.current(), id);
		Object name = body.get("order");
		if (!(name instanceof String text)) {
			throw new ResponseStatusException(HttpStatus.BAD_REQUEST,
					"order must be one of " + Arrays.stream(QueueOrder.values()).map(QueueOrder::apiName).toList());
		}
		QueueOrder order;
		try {
			order = QueueOrder.of(text);
		}
		catch (IllegalArgumentException ex) {
			throw new ResponseStatusException(HttpStatus.BAD_REQUEST, ex.getMessage());
		}
		Object seedValue = body.get("seed");
		if (seedValue != null && !(seedValue instanceof Number)) {
			throw new ResponseStatusException(HttpStatus.BAD_REQUEST, "seed must be a whole number");
		}
		long seed = (seedValue != null) ? ((Number) seedValue).longValue() : System.nanoTime();
		List<long[]> ids = new ArrayList<>();
		List<Double> risks = new ArrayList<>();
		List<double[]> boxes = new ArrayList<>();
		this.jdbc.query("select id, risk, min_x, min_y, max_x, max_y from cell where batch_id = ? order by seq",
				(RowCallbackHandler) (rs) -> {
					ids.add(new long[] { rs.getLong(1) });
					risks.add(rs.getDouble(2));
					boxes.add(new double[] { rs.getDouble(3), rs.getDouble(4), rs.getDouble(5), rs.getDouble(6) });
				}, id);
		int[] rank = CellRanking.rank(order, seed, risks.stream().mapToDouble(Double::doubleValue).toArray(),
				boxes.toArray(double[][]::new));
		List<Object[]> updates = new ArrayList<>(rank.length);
		for (int i = 0; i < rank.length; i++) {
			updates.add(new Object[] { rank[i], ids.get(i)[0] });
		}
		this.jdbc.batchUpdate("update cell set queue_rank = ? where id = ?", updates);
		this.jdbc.update("update batch set queue_order = ?, queue_seed = ? where id = ?", order.apiName(), seed, id);
		return queueOrder(id);
	}

	private Map<String, Object> queueOrder(long id) {
		Map<String, Object> body = new LinkedHashMap<>();
		this.jdbc.query("select queue_order, queue_seed from batch where id = ?", (RowCallbackHandler) (rs) -> {
			body.put("queueOrder", rs.getString(1));
			body.put("queueSeed", rs.getLong(2));
		}, id);
		return body;
	}

	private Object storedSettings(long id) {
		String stored = this.jdbc.queryForObject("select check_settings from batch where id = ?", String.class, id);
		return (stored != null) ? this.json.readTree(stored) : null;
	}

	private static Map<String, Object> kind(FlagKind kind) {
		Map<String, Object> row = new LinkedHashMap<>();
		row.put("code", kind.code());
		row.put("label", kind.label());
		row.put("weight", kind.weight());
		return row;
	}

}
