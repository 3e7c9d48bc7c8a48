package org.assay.export;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;

import org.assay.accounts.AccountService;
import org.assay.batches.BatchSummary;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Polygonal;
import java.util.Set;
import java.util.TreeSet;

import org.assay.export.training.TrainingSetSpec;
import org.assay.review.ReasonCatalogue;
import org.assay.review.ReasonCode;
import org.assay.review.Verdict;

import org.springframework.http.ContentDisposition;
import org.springframework.http.HttpHeaders;
import org.springframework.http.HttpStatus;
import org.springframework.http.MediaType;
import org.springframework.http.ResponseEntity;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.bind.annotation.RestController;
import org.springframework.web.server.ResponseStatusException;
import org.springframework.web.servlet.mvc.method.annotation.StreamingResponseBody;

/**
 * Downloads of verified batches, for the batch's leads. Options on every export:
 * {@code onlyNew} (leave out drafts found already on the map), {@code onlyReviewedTwice}
 * (only drafts reviewed twice or ruled), {@code within} (a GeoJSON Polygon or
 * MultiPolygon in WGS84: only drafts that intersect it).
 */
@RestController
class ExportController {

	private final GeoJsonExport geoJson;

	private final GeoPackageExport geoPackage;

	private final org.assay.batches.BatchService batches;

	private final AccountService accounts;

	private final TrainingSetExport training;

	private final ReasonCatalogue catalogue;

	ExportController(GeoJsonExport geoJson, GeoPackageExport geoPackage, org.assay.batches.BatchService batches,
			AccountService accounts, TrainingSetExport training, ReasonCatalogue catalogue) {
		this.training = training;
		this.catalogue = catalogue;
		this.geoJson = geoJson;
		this.geoPackage = geoPackage;
		this.batches = batches;
		this.accounts = accounts;
	}

	@GetMapping("/api/batches/{batchId}/export.geojson")
	ResponseEntity<StreamingResponseBody> geoJson(@PathVariable long batchId,
			@RequestParam(defaultValue = "false") boolean onlyNew,
			@RequestParam(defaultValue = "false") boolean onlyReviewedTwice,
			@RequestParam(required = false) String within) {
		BatchSummary batch = this.batches.requireRun(this.accounts.current(), batchId);
		ExportOptions options = options(onlyNew, onlyReviewedTwice, within);
		StreamingResponseBody body = (out) -> this.geoJson.write(batch, options, out);
		return ResponseEntity.ok()
			.contentType(MediaType.parseMediaType("application/geo+json"))
			.header(HttpHeaders.CONTENT_DISPOSITION, attachment("batch-" + batchId + "-verified.geojson"))
			.body(body);
	}

	/**
	 * The verified features as a GeoPackage. SQLite needs a file it can seek in, so the
	 * package is written to a temporary file first and streamed from there.
	 */
	@GetMapping("/api/batches/{batchId}/export.gpkg")
	ResponseEntity<StreamingResponseBody> geoPackage(@PathVariable long batchId,
			@RequestParam(defaultValue = "false") boolean onlyNew,
			@RequestParam(defaultValue = "false") boolean onlyReviewedTwice,
			@RequestParam(required = false) String within) throws IOException {
		BatchSummary batch = this.batches.requireRun(this.accounts.current(), batchId);
		ExportOptions options = options(onlyNew, onlyReviewedTwice, within);
		Path folder = Files.createTempDirectory("assay-gpkg-");
		Path file = folder.resolve("export.gpkg");
		try {
			this.geoPackage.write(batch, options, file);
		}
		catch (RuntimeException ex) {
			deleteQuietly(folder, file);
			throw ex;
		}
		long size = Files.size(file);
		StreamingResponseBody body = (out) -> {
			try (InputStream in = Files.newInputStream(file)) {
				in.transferTo(out);
			}
			finally {
				deleteQuietly(folder, file);
			}
		};
		return ResponseEntity.ok()
			.contentType(MediaType.parseMediaType("application/geopackage+sqlite3"))
			.contentLength(size)
			.header(HttpHeaders.CONTENT_DISPOSITION, attachment("batch-" + batchId + "-verified.gpkg"))
			.body(body);
	}

	/**
	 * The hard-negative training set as a zip, streamed. Options: {@code zoom} of the
	 * mask tiles (default 18), {@code roadWidth} in metres (default 6), {@code reasons}
	 * (comma separated reason codes; all when absent), {@code amended} (add amended
	 * drafts as corrected examples), {@code within} (a polygon of interest).
	 */
	@GetMapping("/api/batches/{batchId}/training.zip")
	ResponseEntity<StreamingResponseBody> trainingSet(@PathVariable long batchId,
			@RequestParam(defaultValue = "" + TrainingSetSpec.DEFAULT_ZOOM) int zoom,
			@RequestParam(defaultValue = "" + TrainingSetSpec.DEFAULT_ROAD_WIDTH) double roadWidth,
			@RequestParam(required = false) String reasons, @RequestParam(defaultValue = "false") boolean amended,
			@RequestParam(required = false) String within) {
		BatchSummary batch = this.batches.requireRun(this.accounts.current(), batchId);
		TrainingSetSpec spec;
		try {
			spec = new TrainingSetSpec(zoom, roadWidth, "");
		}
		catch (IllegalArgumentException ex) {
			throw new ResponseStatusException(HttpStatus.BAD_REQUEST, ex.getMessage());
		}
		Set<String> codes = reasonCodes(batch, reasons, amended);
		TrainingSetExport.Selection selection = new TrainingSetExport.Selection(spec, codes, amended,
				options(false, false, within).within());
		StreamingResponseBody body = (out) -> this.training.write(batch, selection, out);
		return ResponseEntity.ok()
			.contentType(MediaType.parseMediaType("application/zip"))
			.header(HttpHeaders.CONTENT_DISPOSITION, attachment("batch-" + batchId + "-training-z" + zoom + ".zip"))
			.body(body);
	}

	/** The reason codes asked for, each one of the batch's REJECT (or AMEND) codes. */
	private Set<String> reasonCodes(BatchSummary batch, String reasons, boolean amended) {
		Set<String> codes = new TreeSet<>();
		if (reasons == null || reasons.isBlank()) {
			return codes;
		}
		Set<String> known = new TreeSet<>();
		for (ReasonCode reason : this.catalogue.reasons(batch.reasonCatalogue())) {
			if (reason.verdict() == Verdict.REJECT || (amended && reason.verdict() == Verdict.AMEND)) {
				known.add(reason.code());
			}
		}
		for (String code : reasons.split(",")) {
			String trimmed = code.trim();
			if (trimmed.isEmpty()) {
				continue;
			}
			if (!known.contains(trimmed)) {
				throw new ResponseStatusException(HttpStatus.BAD_REQUEST,
						"reasons: '" + trimmed + "' is not a reason code of a "
								+ (amended ? "REJECT or AMEND" : "REJECT")
								+ " verdict in this batch's catalogue; known: " + String.join(", ", known));
			}
			codes.add(trimmed);
		}
		return codes;
	}

	private ExportOptions options(boolean onlyNew, boolean onlyReviewedTwice, String within) {
		Geometry polygon = null;
		if (within != null && !within.isBlank()) {
			try {
				polygon = WithinPolygon.parse(within);
			}
			catch (RuntimeException ex) {
				throw new ResponseStatusException(HttpStatus.BAD_REQUEST,
						"within must be a GeoJSON Polygon or MultiPolygon: " + ex.getMessage());
			}
			if (!(polygon instanceof Polygonal) || polygon.isEmpty() || !polygon.isValid()) {
				throw new ResponseStatusException(HttpStatus.BAD_REQUEST,
						"within must be a valid, non-empty GeoJSON Polygon or MultiPolygon");
			}
		}
		return new ExportOptions(onlyNew, onlyReviewedTwice, polygon);
	}

	private static String attachment(String name) {
		return ContentDisposition.attachment().filename(name).build().toString();
	}

	private static void deleteQuietly(Path folder, Path file) {
		try {
			Files.deleteIfExists(file);
			Files.deleteIfExists(folder);
		}
		catch (IOException ex) {
			// a temporary file; the system cleans up what is left
		}
	}

}
