package org.assay.batches;

import java.util.SplittableRandom;

/**
 * Chooses the cells of a batch that are reviewed twice: a simple random sample of
 * {@code round(share * cells)} cells (at least one when the share is above 0), drawn by a
 * partial Fisher-Yates shuffle from the batch's recorded seed, so that the same seed
 * chooses the same cells.
 */
final class SecondReviewPick {

	private SecondReviewPick() {
	}

	/**
	 * Chooses cells.
	 * @param cells the number of cells
	 * @param share the share to choose, 0 to 1
	 * @param seed the seed
	 * @return for each cell whether it is chosen
	 */
	static boolean[] choose(int cells, double share, long seed) {
		boolean[] chosen = new boolean[cells];
		if (cells == 0 || share <= 0) {
			return chosen;
		}
		int count = (int) Math.min(cells, Math.max(1, Math.round(share * cells)));
		int[] order = new int[cells];
		for (int i = 0; i < cells; i++) {
			order[i] = i;
		}
		SplittableRandom random = new SplittableRandom(seed);
		for (int i = 0; i < count; i++) {
			int j = i + random.nextInt(cells - i);
			int swap = order[i];
			order[i] = order[j];
			order[j] = swap;
			chosen[order[i]] = true;
		}
		return chosen;
	}

}
