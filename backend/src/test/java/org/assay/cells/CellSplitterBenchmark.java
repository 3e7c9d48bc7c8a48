package org.assay.cells;

import java.util.Arrays;
import java.util.SplittableRandom;

/**
 * Times {@link CellSplitter} on a million generated drafts; a separate command, not a
 * test.
 *
 * <p>
 * The drafts lie in a one-degree square: 70% clustered around 2,000 settlements, 30%
 * spread evenly, a third of them roads up to 600 m long. Five warm-up runs, then ten
 * timed runs; prints the fastest and median times, the cells and the over-limit cells. It
 * needs only the compiled classes; from the repository root, after the cell tests have
 * compiled them, with an optional draft count:
 *
 * <pre>
 * java -cp backend/target/classes:backend/target/test-classes org.assay.cells.CellSplitterBenchmark
 * </pre>
 */
public final class CellSplitterBenchmark {

	private CellSplitterBenchmark() {
	}

	/**
	 * Runs the benchmark.
	 * @param args optionally the number of drafts
	 */
	public static void main(String[] args) {
		int n = (args.length > 0) ? Integer.parseInt(args[0]) : 1_000_000;
		SplittableRandom random = new SplittableRandom(42);
		double[] x = new double[n];
		double[] y = new double[n];
		double[] road = new double[n];
		double[] centres = new double[2 * 2_000];
		for (int i = 0; i < centres.length; i++) {
			centres[i] = random.nextDouble();
		}
		for (int i = 0; i < n; i++) {
			boolean clustered = random.nextDouble() < 0.7;
			int c = 2 * random.nextInt(2_000);
			x[i] = 36.3 + clamp(clustered ? centres[c] + 0.01 * random.nextGaussian() : random.nextDouble());
			y[i] = -1.8 + clamp(clustered ? centres[c + 1] + 0.01 * random.nextGaussian() : random.nextDouble());
			road[i] = (random.nextInt(3) == 0) ? random.nextDouble(600) : 0;
		}
		CellPlan plan = null;
		for (int i = 0; i < 5; i++) {
			plan = CellSplitter.split(x, y, road, CellLimits.DEFAULT);
		}
		long[] nanos = new long[10];
		for (int i = 0; i < nanos.length; i++) {
			long start = System.nanoTime();
			plan = CellSplitter.split(x, y, road, CellLimits.DEFAULT);
			nanos[i] = System.nanoTime() - start;
		}
		Arrays.sort(nanos);
		System.out.printf("drafts %,d: fastest %.1f ms, median %.1f ms, %,d cells, %,d over limit%n", n, nanos[0] / 1e6,
				nanos[nanos.length / 2] / 1e6, plan.cells().size(), plan.overLimitCount());
	}

	private static double clamp(double value) {
		return Math.max(0, Math.min(1, value));
	}

}
