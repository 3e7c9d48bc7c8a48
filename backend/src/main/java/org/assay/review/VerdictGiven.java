package org.assay.review;

import java.util.UUID;

/**
 * Published when a verdict is stored.
 *
 * @param verdictId the verdict
 * @param batchId its batch
 * @param cellId its cell
 * @param draftId its draft
 * @param validatorId who gave it
 * @param verdict the verdict
 */
public record VerdictGiven(UUID verdictId, long batchId, long cellId, long draftId, long validatorId, Verdict verdict) {
}
