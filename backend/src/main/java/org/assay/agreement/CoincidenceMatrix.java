package org.assay.agreement;

import java.util.List;
import java.util.TreeMap;

/**
 * The coincidence matrix of Krippendorff (2011): within each unit that has m<sub>u</sub>
 * &ge; 2 values, every ordered pair of values from different coders adds 1/(m<sub>u</sub>
 * - 1) to o<sub>ck</sub>; units with fewer than two values are not pairable and add
 * nothing. Its margins n<sub>c</sub> = &Sigma;<sub>k</sub> o<sub>ck</sub> count the
 * pairable values of each kind, and n = &Sigma; n<sub>c</sub> all of them.
 */
final class CoincidenceMatrix {

	/** The distinct values, in ascending order. */
	final double[] values;

	/** o_ck. */
	final double[][] coincidences;

	/**
	 * n_c, counted directly (it equals the row sum of o_ck) to keep it an exact integer.
	 */
	final double[] totals;

	/** n. */
	final double pairable;

	private CoincidenceMatrix(double[] values, double[][] coincidences, long[] totals) {
		this.values = values;
		this.coincidences = coincidences;
		this.totals = new double[values.length];
		long sum = 0;
		for (int c = 0; c < values.length; c++) {
			this.totals[c] = totals[c];
			sum += totals[c];
		}
		this.pairable = sum;
	}

	/**
	 * Builds the matrix.
	 * @param units the values each unit received, missing values already left out
	 * @return the matrix over the distinct values of the pairable units
	 */
	static CoincidenceMatrix of(List<double[]> units) {
		TreeMap<Double, Integer> index = new TreeMap<>();
		for (double[] unit : units) {
			if (unit.length >= 2) {
				for (double value : unit) {
					index.put(value, 0);
				}
			}
		}
		double[] values = new double[index.size()];
		int next = 0;
		for (var entry : index.entrySet()) {
			values[next] = entry.getKey();
			entry.setValue(next++);
		}
		double[][] coincidences = new double[values.length][values.length];
		long[] totals = new long[values.length];
		for (double[] unit : units) {
			int m = unit.length;
			for (int a = 0; m >= 2 && a < m; a++) {
				totals[index.get(unit[a])]++;
				for (int b = 0; b < m; b++) {
					if (a != b) {
						coincidences[index.get(unit[a])][index.get(unit[b])] += 1.0 / (m - 1);
					}
				}
			}
		}
		return new CoincidenceMatrix(values, coincidences, totals);
	}

}
