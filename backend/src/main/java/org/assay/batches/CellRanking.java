package org.assay.batches;

import java.util.Arrays;
import java.util.Comparator;
import java.util.SplittableRandom;
import java.util.stream.IntStream;

/**
 * Places cells in a batch's queue order: for each cell (by its position in the plan) its
 * rank, 0 first.
 */
final class CellRanking {

	private CellRanking() {
	}

	/**
	 * Ranks cells.
	 * @param order the queue order
	 * @param seed the seed of the random order
	 * @param risk each cell's risk
	 * @param box each cell's west, south, east, north
	 * @return each cell's rank
	 */
	static int[] rank(QueueOrder order, long seed, double[] risk, double[][] box) {
		int count = risk.length;
		Integer[] cells = IntStream.range(0, count).boxed().toArray(Integer[]::new);
		switch (order) {
			case RISK ->
				Arrays.sort(cells, Comparator.<Integer>comparingDouble((c) -> -risk[c]).thenComparingInt((c) -> c));
			case AREA -> {
				// the plan's own order
			}
			case SWEEP -> {
				double row = medianHeight(box);
				double north = Arrays.stream(box).mapToDouble((b) -> b[3]).max().orElse(0);
				Arrays.sort(cells,
						Comparator.<Integer>comparingLong((c) -> (long) Math.floor((north - centre(box[c], 1)) / row))
							.thenComparingDouble((c) -> centre(box[c], 0))
							.thenComparingInt((c) -> c));
			}
			case RANDOM -> {
				SplittableRandom random = new SplittableRandom(seed);
				for (int i = count - 1; i > 0; i--) {
					int j = random.nextInt(i + 1);
					Integer swap = cells[i];
					cells[i] = cells[j];
					cells[j] = swap;
				}
			}
		}
		int[] rank = new int[count];
		for (int r = 0; r < count; r++) {
			rank[cells[r]] = r;
		}
		return rank;
	}

	private static double centre(double[] box, int axis) {
		return (box[axis] + box[axis + 2]) / 2;
	}

	private static double medianHeight(double[][] box) {
		double[] heights = Arrays.stream(box).mapToDouble((b) -> b[3] - b[1]).sorted().toArray();
		double median = (heights.length > 0) ? heights[heights.length / 2] : 1;
		return (median > 0) ? median : 1e-6;
	}

}
