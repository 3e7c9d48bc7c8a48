package org.assay.queue;

/**
 * A cell's progress after a decision was counted.
 *
 * @param cellId the cell
 * @param decidedCount drafts with a current verdict
 * @param draftCount drafts in the cell
 * @param finished whether every draft has a current verdict
 * @param finishedNow whether this decision finished the cell
 */
public record CellProgress(long cellId, int decidedCount, int draftCount, boolean finished, boolean finishedNow) {
}
