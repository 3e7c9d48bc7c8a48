package org.assay.batches;

import java.io.IOException;
import java.net.URI;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.UUID;

import org.assay.accounts.Account;
import org.assay.accounts.AccountService;
import org.assay.checks.CheckSettings;
import tools.jackson.databind.ObjectMapper;

import org.springframework.http.HttpStatus;
import org.springframework.http.MediaType;
import org.springframework.http.ProblemDetail;
import org.springframework.http.ResponseEntity;
import org.springframework.security.access.prepost.PreAuthorize;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.bind.annotation.RestController;
import org.springframework.web.multipart.MultipartFile;
import org.springframework.web.server.ResponseStatusException;

/**
 * Upload batches, follow upload jobs, list and read batches.
 */
@RestController
class BatchController {

	private static final Duration LONGEST_WAIT = Duration.ofMinutes(30);

	private final AccountService accounts;

	private final BatchService batches;

	private final UploadService uploads;

	private final UploadProperties properties;

	private final CheckSettingsJson checkSettings;

	BatchController(AccountService accounts, BatchService batches, UploadService uploads, UploadProperties properties,
			ObjectMapper json) {
		this.checkSettings = new CheckSettingsJson(json);
		this.accounts = accounts;
		this.batches = batches;
		this.uploads = uploads;
		this.properties = properties;
	}

	@GetMapping("/api/batches")
	List<BatchSummary> list() {
		return this.batches.visibleTo(this.accounts.current());
	}

	@GetMapping("/api/batches/{id}")
	BatchSummary get(@PathVariable long id) {
		return this.batches.requireVisible(this.accounts.current(), id);
	}

	/**
	 * Uploads a batch: a GeoJSON FeatureCollection of drafts and an optional reference
	 * layer, as multipart form parts. Answers 202 with the job, or with {@code wait=true}
	 * the ended job (201) or its problem.
	 */
	@PostMapping(path = "/api/batches", consumes = MediaType.MULTIPART_FORM_DATA_VALUE)
	@PreAuthorize("hasAnyRole('LEAD', 'ADMIN')")
	ResponseEntity<?> upload(@RequestParam("drafts") MultipartFile drafts,
			@RequestParam(name = "reference", required = false) MultipartFile reference,
			@RequestParam(name = "name", required = false) String name,
			@RequestParam(name = "modelName", defaultValue = "unknown") String modelName,
			@RequestParam(name = "modelVersion", defaultValue = "unknown") String modelVersion,
			@RequestParam(name = "imageryUrl", required = false) String imageryUrl,
			@RequestParam(name = "maxDraftsPerCell", defaultValue = "60") int maxDraftsPerCell,
			@RequestParam(name = "maxRoadKmPerCell", defaultValue = "15") double maxRoadKmPerCell,
			@RequestParam(name = "leaseMinutes", defaultValue = "30") int leaseMinutes,
			@RequestParam(name = "reasonCatalogue", defaultValue = UploadSettings.DEFAULT_CATALOGUE) String catalogue,
			@RequestParam(name = "checks", required = false) String checks,
			@RequestParam(name = "queueOrder", defaultValue = "risk") String queueOrder,
			@RequestParam(name = "queueSeed", required = false) Long queueSeed,
			@RequestParam(name = "secondReviewShare", defaultValue = "0.1") double secondShare,
			@RequestParam(name = "secondReviewSeed", required = false) Long secondSeed,
			@RequestParam(name = "wait", defaultValue = "false") boolean wait) throws IOException {
		Account account = this.accounts.current();
		String batchName = (name == null || name.isBlank()) ? drafts.getOriginalFilename() : name.strip();
		CheckSettings checkSettings;
		QueueOrder order;
		try {
			checkSettings = this.checkSettings.read(checks);
			order = QueueOrder.of(queueOrder);
		}
		catch (IllegalArgumentException ex) {
			throw new ResponseStatusException(HttpStatus.BAD_REQUEST, ex.getMessage());
		}
		UploadSettings settings = new UploadSettings(batchName, modelName.strip(), modelVersion.strip(),
				blankToNull(imageryUrl), maxDraftsPerCell, maxRoadKmPerCell, leaseMinutes, catalogue, checkSettings,
				order, (queueSeed != null) ? queueSeed : System.nanoTime(), secondShare,
				(secondSeed != null) ? secondSeed : System.nanoTime());
		SettingsCheck.check(settings);
		Files.createDirectories(this.properties.spoolDir());
		Path draftsFile = receive(drafts);
		Path referenceFile = (reference != null && !reference.isEmpty()) ? receive(reference) : null;
		UploadStatus status = this.uploads.submit(account, settings, draftsFile, referenceFile);
		if (wait) {
			status = this.uploads.await(status.id(), LONGEST_WAIT);
		}
		return answer(status);
	}

	@GetMapping("/api/uploads/{id}")
	UploadStatus job(@PathVariable UUID id) {
		Account account = this.accounts.current();
		return this.uploads.status(id)
			.filter((status) -> status.createdBy() == account.id() || account.isAdmin())
			.orElseThrow(() -> new ResponseStatusException(HttpStatus.NOT_FOUND, "No upload job " + id));
	}

	private ResponseEntity<?> answer(UploadStatus status) {
		URI job = URI.create("/api/uploads/" + status.id());
		if (status.state() == UploadStatus.State.DONE) {
			return ResponseEntity.created(URI.create("/api/batches/" + status.batchId())).body(status);
		}
		if (status.state() == UploadStatus.State.FAILED) {
			ProblemDetail problem = ProblemDetail
				.forStatus(((Number) status.problem().getOrDefault("status", 422)).intValue());
			status.problem().forEach((key, value) -> {
				switch (key) {
					case "type" -> problem.setType(URI.create(String.valueOf(value)));
					case "title" -> problem.setTitle(String.valueOf(value));
					case "detail" -> problem.setDetail(String.valueOf(value));
					case "status" -> {
					}
					default -> problem.setProperty(key, value);
				}
			});
			problem.setProperty("job", job.toString());
			return ResponseEntity.status(problem.getStatus())
				.contentType(MediaType.APPLICATION_PROBLEM_JSON)
				.body(problem);
		}
		return ResponseEntity.accepted().location(job).body(status);
	}

	private Path receive(MultipartFile part) throws IOException {
		Path file = Files.createTempFile(this.properties.spoolDir(), "part-", ".geojson");
		part.transferTo(file);
		return file;
	}

	private static String blankToNull(String value) {
		return (value == null || value.isBlank()) ? null : value.strip();
	}

}
