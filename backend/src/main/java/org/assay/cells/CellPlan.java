package org.assay.cells;

import java.util.Arrays;
import java.util.List;

/**
 * The result of splitting: the cells, and for each draft the index of its cell.
 *
 * <p>
 * Cells are listed in the quadtree's depth-first order (south-west, south-east,
 * north-west, north-east at each level, a Z-order sweep), so cells with nearby indices
 * lie near each other. The array is handed over, not copied, to keep large plans cheap:
 * do not modify it. Two plans are equal when their cells and assignments are equal.
 *
 * @param cells the cells, none empty
 * @param cellOfDraft for draft {@code i} (in input order) the index into {@code cells}
 */
public record CellPlan(List<CellBox> cells, int[] cellOfDraft) {

	/**
	 * Takes an unmodifiable copy of the cell list.
	 */
	public CellPlan {
		cells = List.copyOf(cells);
	}

	/**
	 * The number of drafts in the plan.
	 * @return the number of drafts
	 */
	public int draftCount() {
		return this.cellOfDraft.length;
	}

	/**
	 * The cell of one draft.
	 * @param draft the draft's index in the input
	 * @return its cell
	 */
	public CellBox cellOf(int draft) {
		return this.cells.get(this.cellOfDraft[draft]);
	}

	/**
	 * The number of cells that exceed a limit because they could not be split further.
	 * @return the number of over-limit cells
	 */
	public int overLimitCount() {
		int count = 0;
		for (CellBox cell : this.cells) {
			if (cell.overLimit()) {
				count++;
			}
		}
		return count;
	}

	@Override
	public boolean equals(Object other) {
		return (other instanceof CellPlan plan) && this.cells.equals(plan.cells)
				&& Arrays.equals(this.cellOfDraft, plan.cellOfDraft);
	}

	@Override
	public int hashCode() {
		return 31 * this.cells.hashCode() + Arrays.hashCode(this.cellOfDraft);
	}

	@Override
	public String toString() {
		return "CellPlan[" + this.cells.size() + " cells, " + this.cellOfDraft.length + " drafts, " + overLimitCount()
				+ " over limit]";
	}

}
