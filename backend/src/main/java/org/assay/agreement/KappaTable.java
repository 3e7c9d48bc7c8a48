package org.assay.agreement;

/**
 * The shares of a two-rater contingency table with agreement weights, and the sums of
 * Fleiss, Cohen and Everitt (1969) over them; see {@link CohenKappa} for the formulas.
 * Disagreements are summed directly (&Sigma; (1 - w<sub>ij</sub>) &hellip;) rather than
 * as 1 minus an agreement, so that a table with all items in one category gives a chance
 * disagreement of exactly 0.
 */
final class KappaTable {

	final long total;

	private final int k;

	private final double[][] p;

	private final double[] rows;

	private final double[] columns;

	private final double[][] weights;

	KappaTable(long[][] counts, double[][] weights) {
		this.k = counts.length;
		checkSquare(counts, weights);
		long sum = 0;
		for (long[] row : counts) {
			for (long count : row) {
				if (count < 0) {
					throw new IllegalArgumentException("Counts must not be negative, not " + count);
				}
				sum += count;
			}
		}
		this.total = sum;
		this.weights = weights;
		this.p = new double[this.k][this.k];
		this.rows = new double[this.k];
		this.columns = new double[this.k];
		for (int i = 0; i < this.k; i++) {
			for (int j = 0; j < this.k; j++) {
				this.p[i][j] = counts[i][j] / (double) sum;
				this.rows[i] += this.p[i][j];
				this.columns[j] += this.p[i][j];
			}
		}
	}

	static double[][] identity(int k) {
		double[][] identity = new double[k][k];
		for (int i = 0; i < k; i++) {
			identity[i][i] = 1;
		}
		return identity;
	}

	private void checkSquare(long[][] counts, double[][] weights) {
		if (weights.length != this.k) {
			throw new IllegalArgumentException("The weights must be " + this.k + " by " + this.k);
		}
		for (int i = 0; i < this.k; i++) {
			if (counts[i].length != this.k || weights[i].length != this.k) {
				throw new IllegalArgumentException(
						"The table and its weights must be square, " + this.k + " by " + this.k);
			}
			for (int j = 0; j < this.k; j++) {
				double w = weights[i][j];
				if ((i == j && w != 1) || !(w >= 0 && w <= 1)) {
					throw new IllegalArgumentException(
							"Agreement weights must be 1 on the diagonal and between 0 and 1 elsewhere, not " + w);
				}
			}
		}
	}

	double agreement() {
		return sum((i, j) -> this.weights[i][j] * this.p[i][j]);
	}

	double disagreement() {
		return sum((i, j) -> (1 - this.weights[i][j]) * this.p[i][j]);
	}

	double chanceAgreement() {
		return sum((i, j) -> this.weights[i][j] * this.rows[i] * this.columns[j]);
	}

	double chanceDisagreement() {
		return sum((i, j) -> (1 - this.weights[i][j]) * this.rows[i] * this.columns[j]);
	}

	double variance(double kappa) {
		double pe = chanceAgreement();
		double a = sum((i, j) -> {
			double d = this.weights[i][j] - (rowMean(i) + columnMean(j)) * (1 - kappa);
			return this.p[i][j] * d * d;
		});
		double c = kappa - pe * (1 - kappa);
		return Math.max(0, (a - c * c) / (this.total * square(1 - pe)));
	}

	double nullVariance() {
		double pe = chanceAgreement();
		double a = sum((i, j) -> {
			double d = this.weights[i][j] - (rowMean(i) + columnMean(j));
			return this.rows[i] * this.columns[j] * d * d;
		});
		return Math.max(0, (a - pe * pe) / (this.total * square(1 - pe)));
	}

	/** w&#772;_i. = &Sigma;_j c_j w_ij. */
	private double rowMean(int i) {
		double mean = 0;
		for (int j = 0; j < this.k; j++) {
			mean += this.columns[j] * this.weights[i][j];
		}
		return mean;
	}

	/** w&#772;_.j = &Sigma;_i r_i w_ij. */
	private double columnMean(int j) {
		double mean = 0;
		for (int i = 0; i < this.k; i++) {
			mean += this.rows[i] * this.weights[i][j];
		}
		return mean;
	}

	private double sum(Cell cell) {
		double sum = 0;
		for (int i = 0; i < this.k; i++) {
			for (int j = 0; j < this.k; j++) {
				sum += cell.value(i, j);
			}
		}
		return sum;
	}

	private static double square(double x) {
		return x * x;
	}

	@FunctionalInterface
	private interface Cell {

		double value(int i, int j);

	}

}
