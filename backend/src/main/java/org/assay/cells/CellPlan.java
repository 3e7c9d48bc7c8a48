package org.assay.cells;

import java.util.List;

/**
 * The result of splitting: the cells, and for each draft the index of its cell.
 *
 * @param cells the cells, none empty
 * @param cellOfDraft for draft {@code i} (in input order) the index into {@code cells}
 */
public record CellPlan(List<CellBox> cells, int[] cellOfDraft) {
}
