package org.assay.export;

import org.assay.accounts.AccountService;
import org.assay.batches.BatchService;
import org.assay.batches.BatchSummary;

import org.springframework.http.ContentDisposition;
import org.springframework.http.HttpHeaders;
import org.springframework.http.MediaType;
import org.springframework.http.ResponseEntity;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.RestController;
import org.springframework.web.servlet.mvc.method.annotation.StreamingResponseBody;

/**
 * Downloads of verified batches, for the batch's leads.
 */
@RestController
class ExportController {

	private final GeoJsonExport geoJson;

	private final BatchService batches;

	private final AccountService accounts;

	ExportController(GeoJsonExport geoJson, BatchService batches, AccountService accounts) {
		this.geoJson = geoJson;
		this.batches = batches;
		this.accounts = accounts;
	}

	@GetMapping("/api/batches/{batchId}/export.geojson")
	ResponseEntity<StreamingResponseBody> geoJson(@PathVariable long batchId) {
		BatchSummary batch = this.batches.requireRun(this.accounts.current(), batchId);
		StreamingResponseBody body = (out) -> this.geoJson.write(batch, out);
		return ResponseEntity.ok()
			.contentType(MediaType.parseMediaType("application/geo+json"))
			.header(HttpHeaders.CONTENT_DISPOSITION,
					ContentDisposition.attachment()
						.filename("batch-" + batchId + "-verified.geojson")
						.build()
						.toString())
			.body(body);
	}

}
