package org.assay.review;

import java.time.Instant;
import java.util.UUID;

import org.locationtech.jts.geom.Geometry;

/**
 * One stored verdict. Verdicts are never changed; a changed mind is a new verdict that
 * supersedes the old one.
 *
 * @param id the client-supplied id
 * @param draftId the draft
 * @param cellId the draft's cell
 * @param batchId the draft's batch
 * @param validatorId who gave it
 * @param validator their username
 * @param verdict the verdict
 * @param reasonCode its reason code
 * @param comment the comment, or {@code null}
 * @param geometry the corrected geometry for AMEND, else {@code null}
 * @param supersedes the verdict it replaced, or {@code null}
 * @param createdAt when it was stored
 */
public record VerdictRecord(UUID id, long draftId, long cellId, long batchId, long validatorId, String validator,
		Verdict verdict, String reasonCode, String comment, Geometry geometry, UUID supersedes, Instant createdAt) {
}
