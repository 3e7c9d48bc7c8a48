package org.assay.review;

import org.assay.queue.CellProgress;

/**
 * What the server answers to a verdict.
 *
 * @param verdict the stored verdict
 * @param cell the cell's progress afterwards
 * @param repeated whether the verdict was stored by an earlier request with the same id
 */
public record VerdictOutcome(VerdictRecord verdict, CellProgress cell, boolean repeated) {
}
