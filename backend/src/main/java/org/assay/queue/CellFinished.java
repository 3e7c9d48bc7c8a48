package org.assay.queue;

/**
 * Published when the last draft of a cell gets its verdict.
 *
 * @param batchId the batch
 * @param cellId the cell
 * @param validatorId who gave the last verdict
 */
public record CellFinished(long batchId, long cellId, long validatorId) {
}
