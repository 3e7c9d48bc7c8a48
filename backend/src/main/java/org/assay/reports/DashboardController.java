package org.assay.reports;

import java.time.DateTimeException;
import java.time.Duration;
import java.time.ZoneId;
import java.util.Map;

import org.assay.accounts.AccountService;
import org.assay.batches.BatchService;
import org.assay.batches.BatchSummary;

import org.springframework.http.HttpHeaders;
import org.springframework.http.HttpStatus;
import org.springframework.http.MediaType;
import org.springframework.http.ResponseEntity;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.bind.annotation.RestController;
import org.springframework.web.server.ResponseStatusException;

/**
 * The lead's view of a batch ({@link Dashboard}) for the batch's leads and admins: all of
 * it as JSON, each table as CSV. {@code zone} is the viewer's IANA time zone (default
 * UTC); {@code breakMinutes} the gap that counts as a break (default 10).
 */
@RestController
class DashboardController {

	private static final MediaType CSV = MediaType.parseMediaType("text/csv;charset=UTF-8");

	private final Dashboard dashboard;

	private final BatchService batches;

	private final AccountService accounts;

	private final TeamOverview team;

	DashboardController(Dashboard dashboard, TeamOverview team, BatchService batches, AccountService accounts) {
		this.team = team;
		this.dashboard = dashboard;
		this.batches = batches;
		this.accounts = accounts;
	}

	@GetMapping("/api/batches/{id}/dashboard")
	Map<String, Object> view(@PathVariable long id, @RequestParam(defaultValue = "UTC") String zone,
			@RequestParam(defaultValue = "10") int breakMinutes) {
		BatchSummary batch = this.batches.requireRun(this.accounts.current(), id);
		return this.dashboard.view(batch, zone(zone), breakAfter(breakMinutes));
	}

	/**
	 * Across the batches the signed-in lead runs (an admin: all); a validator gets 403.
	 */
	@GetMapping("/api/overview")
	Map<String, Object> overview(@RequestParam(defaultValue = "UTC") String zone) {
		org.assay.accounts.Account me = this.accounts.current();
		if (me.role() == org.assay.accounts.Role.VALIDATOR) {
			throw new ResponseStatusException(HttpStatus.FORBIDDEN, "The overview across batches is for leads");
		}
		java.util.List<BatchSummary> mine = this.batches.visibleTo(me)
			.stream()
			.filter((batch) -> this.batches.runs(me, batch))
			.toList();
		return this.team.view(mine, zone(zone));
	}

	@GetMapping("/api/overview/{table}.csv")
	ResponseEntity<String> overviewCsv(@PathVariable String table, @RequestParam(defaultValue = "UTC") String zone) {
		Map<String, Object> view = overview(zone);
		@SuppressWarnings("unchecked")
		Dashboard.Table found = ((Map<String, Dashboard.Table>) view.get("tables")).get(table);
		if (found == null) {
			throw new ResponseStatusException(HttpStatus.NOT_FOUND,
					"No table " + table + "; the tables are daily, validators");
		}
		return ResponseEntity.ok()
			.contentType(CSV)
			.header(HttpHeaders.CONTENT_DISPOSITION, "attachment; filename=\"overview-" + table + ".csv\"")
			.body(found.csv().toString());
	}

	@GetMapping("/api/batches/{id}/dashboard/cells")
	java.util.List<Map<String, Object>> cells(@PathVariable long id) {
		this.batches.requireRun(this.accounts.current(), id);
		return this.dashboard.cells(id);
	}

	@GetMapping("/api/batches/{id}/dashboard/{table}.csv")
	ResponseEntity<String> csv(@PathVariable long id, @PathVariable String table,
			@RequestParam(defaultValue = "UTC") String zone, @RequestParam(defaultValue = "10") int breakMinutes) {
		BatchSummary batch = this.batches.requireRun(this.accounts.current(), id);
		Dashboard.Table found = this.dashboard.table(batch, table, zone(zone), breakAfter(breakMinutes));
		if (found == null) {
			throw new ResponseStatusException(HttpStatus.NOT_FOUND,
					"No table " + table + "; the tables are " + String.join(", ", Dashboard.TABLES));
		}
		return ResponseEntity.ok()
			.contentType(CSV)
			.header(HttpHeaders.CONTENT_DISPOSITION, "attachment; filename=\"batch-" + id + "-" + table + ".csv\"")
			.body(found.csv().toString());
	}

	private static ZoneId zone(String zone) {
		try {
			return ZoneId.of(zone.strip());
		}
		catch (DateTimeException ex) {
			throw new ResponseStatusException(HttpStatus.BAD_REQUEST,
					"zone must be an IANA time zone such as Europe/Lisbon or UTC, not " + zone);
		}
	}

	private static Duration breakAfter(int minutes) {
		if (minutes < 1 || minutes > 24 * 60) {
			throw new ResponseStatusException(HttpStatus.BAD_REQUEST, "breakMinutes must be 1 to 1440");
		}
		return Duration.ofMinutes(minutes);
	}

}
