package org.assay.review;

import java.util.UUID;

/**
 * Published when a validator takes back a verdict.
 *
 * @param verdictId the withdrawn verdict
 * @param batchId its batch
 * @param cellId its cell
 * @param draftId its draft
 * @param validatorId who took it back (its author)
 * @param restoredId the verdict that stands again in its place, or {@code null} when the
 * draft is undecided again
 */
public record VerdictWithdrawn(UUID verdictId, long batchId, long cellId, long draftId, long validatorId,
		UUID restoredId) {
}
