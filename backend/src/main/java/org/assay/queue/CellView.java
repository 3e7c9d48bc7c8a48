package org.assay.queue;

import java.time.Instant;

/**
 * A cell of work as the API shows it.
 *
 * @param id the cell id
 * @param batchId its batch
 * @param seq its position in the batch's sweep order
 * @param bbox west, south, east, north
 * @param draftCount drafts in the cell
 * @param decidedCount drafts with a current verdict
 * @param overLimit whether it holds more than the limits because it could not be split
 * @param holder the username holding a live claim, or {@code null}
 * @param leaseExpiresAt when that claim lapses, or {@code null}
 * @param assignedTo the username a lead assigned it to, or {@code null}
 * @param finished whether every draft has a current verdict
 * @param pass the review pass the view is of: 1 the first review, 2 the blind second
 * review (then the counts, holder and lease are the second pass's)
 */
public record CellView(long id, long batchId, int seq, double[] bbox, int draftCount, int decidedCount,
		boolean overLimit, String holder, Instant leaseExpiresAt, String assignedTo, boolean finished, int pass) {
}
