package org.assay.reports;

import java.time.Instant;
import java.time.format.DateTimeParseException;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.assay.accounts.AccountService;
import org.assay.agreement.AcceptanceThreshold;
import org.assay.batches.BatchService;

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
 * Agreement and calibration reports of a batch for its leads, as JSON and as CSV tables,
 * optionally for a time window ({@code from}, {@code to}: ISO-8601 instants).
 */
@RestController
class ReportController {

	private static final MediaType CSV = MediaType.parseMediaType("text/csv;charset=UTF-8");

	private final AgreementReport report;

	private final BatchService batches;

	private final AccountService accounts;

	ReportController(AgreementReport report, BatchService batches, AccountService accounts) {
		this.report = report;
		this.batches = batches;
		this.accounts = accounts;
	}

	@GetMapping("/api/batches/{id}/agreement")
	Map<String, Object> agreement(@PathVariable long id, @RequestParam(required = false) String from,
			@RequestParam(required = false) String to) {
		this.batches.requireRun(this.accounts.current(), id);
		return this.report.agreement(id, window(from, to));
	}

	@GetMapping("/api/batches/{id}/agreement/pairs.csv")
	ResponseEntity<String> pairsCsv(@PathVariable long id, @RequestParam(required = false) String from,
			@RequestParam(required = false) String to) {
		this.batches.requireRun(this.accounts.current(), id);
		Csv csv = new Csv().row("first_validator", "second_validator", "drafts", "observed_agreement", "kappa",
				"standard_error", "ci95_lower", "ci95_upper", "landis_koch_1977", "keep_drop_drafts", "keep_drop_kappa",
				"keep_drop_standard_error", "keep_drop_ci95_lower", "keep_drop_ci95_upper",
				"keep_drop_landis_koch_1977");
		for (AgreementReport.PairRow pair : this.report.pairs(id, window(from, to))) {
			Map<String, Object> verdicts = AgreementReport.kappaView(org.assay.agreement.CohenKappa.of(pair.counts()));
			Map<String, Object> keep = AgreementReport
				.kappaView(org.assay.agreement.CohenKappa.of(AgreementReport.keepOrDrop(pair.counts())));
			csv.row(pair.first(), pair.second(), verdicts.get("drafts"), verdicts.get("observedAgreement"),
					verdicts.get("kappa"), verdicts.get("standardError"), lower(verdicts), upper(verdicts),
					verdicts.get("band"), keep.get("drafts"), keep.get("kappa"), keep.get("standardError"), lower(keep),
					upper(keep), keep.get("band"));
		}
		return csv(csv, "agreement-pairs-" + id + ".csv");
	}

	@GetMapping("/api/batches/{id}/agreement/validators.csv")
	ResponseEntity<String> validatorsCsv(@PathVariable long id, @RequestParam(required = false) String from,
			@RequestParam(required = false) String to) {
		this.batches.requireRun(this.accounts.current(), id);
		Csv csv = new Csv().row("validator", "reviewed_twice_or_ruled", "agreed_with_final", "ruled", "overturned",
				"drops_ruled", "drops_upheld");
		for (AgreementReport.ValidatorRow row : this.report.validators(id, window(from, to))) {
			csv.row(row.username(), row.reviewed(), row.agreedWithFinal(), row.ruled(),
					row.ruled() - row.agreedWithRuling(), row.drops(), row.dropsUpheld());
		}
		return csv(csv, "agreement-validators-" + id + ".csv");
	}

	@GetMapping("/api/batches/{id}/calibration")
	Map<String, Object> calibration(@PathVariable long id, @RequestParam(required = false) String from,
			@RequestParam(required = false) String to, @RequestParam(defaultValue = "10") int bands,
			@RequestParam(defaultValue = "0.95") double target, @RequestParam(defaultValue = "lower") String bound,
			@RequestParam(defaultValue = "kept") String outcome) {
		this.batches.requireRun(this.accounts.current(), id);
		return calibrationOf(id, from, to, bands, target, bound, outcome);
	}

	@GetMapping("/api/batches/{id}/calibration.csv")
	ResponseEntity<String> calibrationCsv(@PathVariable long id, @RequestParam(required = false) String from,
			@RequestParam(required = false) String to, @RequestParam(defaultValue = "10") int bands,
			@RequestParam(defaultValue = "kept") String outcome) {
		this.batches.requireRun(this.accounts.current(), id);
		Map<String, Object> body = calibrationOf(id, from, to, bands, 0.95, "lower", outcome);
		Csv csv = new Csv().row("confidence_from", "confidence_to", "drafts", "accepted", "rate", "wilson95_lower",
				"wilson95_upper");
		@SuppressWarnings("unchecked")
		List<Map<String, Object>> rows = (List<Map<String, Object>>) body.get("bands");
		for (Map<String, Object> row : rows) {
			@SuppressWarnings("unchecked")
			List<Double> ci = (List<Double>) row.get("ci95");
			csv.row(row.get("lower"), row.get("upper"), row.get("drafts"), row.get("accepted"), row.get("rate"),
					(ci != null) ? ci.get(0) : null, (ci != null) ? ci.get(1) : null);
		}
		return csv(csv, "calibration-" + id + ".csv");
	}

	private Map<String, Object> calibrationOf(long id, String from, String to, int bands, double target, String bound,
			String outcome) {
		if (bands < 1 || bands > 100) {
			throw new ResponseStatusException(HttpStatus.BAD_REQUEST, "bands must be 1 to 100");
		}
		if (!(target > 0 && target <= 1)) {
			throw new ResponseStatusException(HttpStatus.BAD_REQUEST, "target must be above 0 and at most 1");
		}
		AcceptanceThreshold.Bound which = switch (bound.toLowerCase(Locale.ROOT)) {
			case "lower" -> AcceptanceThreshold.Bound.LOWER;
			case "upper" -> AcceptanceThreshold.Bound.UPPER;
			default -> throw new ResponseStatusException(HttpStatus.BAD_REQUEST, "bound must be lower or upper");
		};
		boolean asDrafted = switch (outcome.toLowerCase(Locale.ROOT)) {
			case "kept" -> false;
			case "accepted" -> true;
			default -> throw new ResponseStatusException(HttpStatus.BAD_REQUEST,
					"outcome must be kept (ACCEPT or AMEND) or accepted (ACCEPT only)");
		};
		return this.report.calibration(id, window(from, to), bands, target, which, asDrafted);
	}

	private static Object lower(Map<String, Object> kappa) {
		@SuppressWarnings("unchecked")
		List<Double> ci = (List<Double>) kappa.get("ci95");
		return (ci != null) ? ci.get(0) : null;
	}

	private static Object upper(Map<String, Object> kappa) {
		@SuppressWarnings("unchecked")
		List<Double> ci = (List<Double>) kappa.get("ci95");
		return (ci != null) ? ci.get(1) : null;
	}

	private static ResponseEntity<String> csv(Csv csv, String name) {
		return ResponseEntity.ok()
			.contentType(CSV)
			.header(HttpHeaders.CONTENT_DISPOSITION, "attachment; filename=\"" + name + "\"")
			.body(csv.toString());
	}

	private static ReportWindow window(String from, String to) {
		try {
			return new ReportWindow((from != null && !from.isBlank()) ? Instant.parse(from.strip()) : null,
					(to != null && !to.isBlank()) ? Instant.parse(to.strip()) : null);
		}
		catch (DateTimeParseException ex) {
			throw new ResponseStatusException(HttpStatus.BAD_REQUEST,
					"from and to must be ISO-8601 instants such as 2026-12-01T00:00:00Z");
		}
		catch (IllegalArgumentException ex) {
			throw new ResponseStatusException(HttpStatus.BAD_REQUEST, ex.getMessage());
		}
	}

}
