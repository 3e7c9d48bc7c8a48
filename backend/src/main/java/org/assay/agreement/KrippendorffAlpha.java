package org.assay.agreement;

import java.util.ArrayList;
import java.util.Collection;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Krippendorff's alpha, for any number of coders, missing values, and nominal or interval
 * data, computed from the coincidence matrix (see {@link CoincidenceMatrix}).
 *
 * <p>
 * With o<sub>ck</sub> the coincidences, n<sub>c</sub> their margins, n the number of
 * pairable values and &delta;&sup2;<sub>ck</sub> the difference function, <pre>
 *   D_o = &Sigma;_c &Sigma;_k o_ck &delta;&sup2;_ck / n
 *   D_e = &Sigma;_c &Sigma;_k n_c n_k &delta;&sup2;_ck / (n (n - 1))
 *   alpha = 1 - D_o / D_e
 * </pre> with &delta;&sup2;<sub>ck</sub> = 0 if c = k and 1 otherwise for nominal data,
 * and (c - k)&sup2; for interval data. Source: Krippendorff, K. (2011), Computing
 * Krippendorff's Alpha-Reliability, Annenberg School for Communication, University of
 * Pennsylvania, sections on nominal and interval data.
 *
 * <p>
 * For two coders, nominal data and no missing values, n = 2N for N units and alpha = 1 -
 * (n - 1)/n &middot; (1 - pi), where pi is Scott's pi (Scott, W.A. 1955, Reliability of
 * content analysis: the case of nominal scale coding, Public Opinion Quarterly
 * 19:321-325; citation from memory); so alpha exceeds pi by (1 - pi)/(2N), vanishing as N
 * grows. Krippendorff presents alpha for this case as pi corrected for small samples
 * (from memory); the relation here is derived from the formulas above. More generally,
 * with m coders and no missing values, alpha = 1 - (n - 1)/n &middot; (1 - kappa) with
 * Fleiss' (1971) kappa and n = Nm (derivation: D_o = 1 - P&#772; and D_e = n/(n - 1)
 * &middot; (1 - P&#772;_e)).
 *
 * <p>
 * Alpha is NaN, with a reason, when no unit has two values (nothing is pairable) and when
 * all pairable values are equal (D_e = 0: there is no variation to agree about).
 */
public final class KrippendorffAlpha {

	private final double observed;

	private final double expected;

	private final double pairable;

	private KrippendorffAlpha(CoincidenceMatrix matrix, boolean interval) {
		double[] v = matrix.values;
		double observed = 0;
		double expected = 0;
		for (int c = 0; c < v.length; c++) {
			for (int k = 0; k < v.length; k++) {
				double delta = interval ? (v[c] - v[k]) * (v[c] - v[k]) : ((c == k) ? 0 : 1);
				observed += matrix.coincidences[c][k] * delta;
				expected += matrix.totals[c] * matrix.totals[k] * delta;
			}
		}
		this.pairable = matrix.pairable;
		this.observed = observed / this.pairable;
		this.expected = expected / (this.pairable * (this.pairable - 1));
	}

	/**
	 * Nominal alpha.
	 * @param units for each unit, the values coders gave it (any objects, compared with
	 * {@code equals}; nulls are missing values)
	 * @return alpha, NaN when undefined
	 */
	public static double nominal(List<? extends Collection<?>> units) {
		return ofNominal(units).alpha();
	}

	/**
	 * Interval alpha.
	 * @param units for each unit, the numbers coders gave it (nulls and NaN are missing)
	 * @return alpha, NaN when undefined
	 */
	public static double interval(List<? extends Collection<? extends Number>> units) {
		return ofInterval(units).alpha();
	}

	/**
	 * Nominal alpha with its disagreements.
	 * @param units for each unit, the values coders gave it, nulls missing
	 * @return the statistics
	 */
	public static KrippendorffAlpha ofNominal(List<? extends Collection<?>> units) {
		Map<Object, Double> codes = new HashMap<>();
		List<double[]> coded = new ArrayList<>();
		for (Collection<?> unit : units) {
			coded.add(unit.stream()
				.filter((value) -> value != null)
				.mapToDouble((value) -> codes.computeIfAbsent(value, (v) -> (double) codes.size()))
				.toArray());
		}
		return new KrippendorffAlpha(CoincidenceMatrix.of(coded), false);
	}

	/**
	 * Interval alpha with its disagreements.
	 * @param units for each unit, the numbers coders gave it, nulls and NaN missing
	 * @return the statistics
	 */
	public static KrippendorffAlpha ofInterval(List<? extends Collection<? extends Number>> units) {
		List<double[]> values = new ArrayList<>();
		for (Collection<? extends Number> unit : units) {
			values.add(unit.stream()
				.filter((value) -> value != null)
				.mapToDouble(Number::doubleValue)
				.filter((value) -> !Double.isNaN(value))
				.toArray());
		}
		return new KrippendorffAlpha(CoincidenceMatrix.of(values), true);
	}

	/**
	 * Turns a reliability data matrix (one row per coder, one column per unit, null where
	 * a coder gave no value) into the values of each unit.
	 * @param <T> the type of a value
	 * @param coders one list per coder, all of the same length
	 * @return one list per unit, missing values left out
	 */
	public static <T> List<List<T>> unitsOf(List<? extends List<? extends T>> coders) {
		int count = coders.isEmpty() ? 0 : coders.get(0).size();
		List<List<T>> units = new ArrayList<>();
		for (int u = 0; u < count; u++) {
			List<T> unit = new ArrayList<>();
			for (List<? extends T> coder : coders) {
				if (coder.size() != count) {
					throw new IllegalArgumentException("Every coder's row must cover the same " + count + " units");
				}
				if (coder.get(u) != null) {
					unit.add(coder.get(u));
				}
			}
			units.add(unit);
		}
		return units;
	}

	/**
	 * @return alpha = 1 - D_o / D_e, NaN when undefined (see {@link #whyUndefined()})
	 */
	public double alpha() {
		return whyUndefined().isPresent() ? Double.NaN : 1 - this.observed / this.expected;
	}

	/**
	 * @return D_o, the observed disagreement
	 */
	public double observedDisagreement() {
		return this.observed;
	}

	/**
	 * @return D_e, the disagreement expected by chance
	 */
	public double expectedDisagreement() {
		return this.expected;
	}

	/**
	 * @return n, the number of pairable values
	 */
	public double pairableValues() {
		return this.pairable;
	}

	/**
	 * @return why alpha is NaN, or empty when it is defined
	 */
	public Optional<String> whyUndefined() {
		if (this.pairable < 2) {
			return Optional.of("No unit has values from two coders, so nothing is pairable");
		}
		if (this.expected == 0) {
			return Optional
				.of("All pairable values are equal, so there is no variation to agree about: " + "alpha is 0/0");
		}
		return Optional.empty();
	}

}
