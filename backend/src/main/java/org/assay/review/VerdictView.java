package org.assay.review;

import java.time.Instant;
import java.util.Map;
import java.util.UUID;

import org.assay.geo.GeoJsonGeometries;
import org.assay.queue.CellProgress;

/**
 * A verdict as the API shows it.
 *
 * @param id the verdict id
 * @param draftId the draft
 * @param verdict the verdict
 * @param reasonCode its reason
 * @param comment the comment, or {@code null}
 * @param validator who gave it
 * @param createdAt when
 * @param geometry the corrected geometry (AMEND), or {@code null}
 * @param supersedes the verdict it replaced, or {@code null}
 * @param cell the cell's progress, where the answer concerns a new verdict
 */
record VerdictView(UUID id, long draftId, Verdict verdict, String reasonCode, String comment, String validator,
		Instant createdAt, Map<String, Object> geometry, UUID supersedes, CellProgress cell) {

	static VerdictView of(VerdictRecord record, CellProgress cell) {
		return new VerdictView(record.id(), record.draftId(), record.verdict(), record.reasonCode(), record.comment(),
				record.validator(), record.createdAt(),
				(record.geometry() != null) ? GeoJsonGeometries.toMap(record.geometry()) : null, record.supersedes(),
				cell);
	}

}
