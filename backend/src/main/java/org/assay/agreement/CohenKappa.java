package org.assay.agreement;

import java.util.Optional;

/**
 * Cohen's kappa for two raters from their k&times;k contingency table, unweighted or
 * weighted, with its large-sample standard errors.
 *
 * <p>
 * Let n be the number of items both rated, p<sub>ij</sub> the share of items the first
 * rater put in category i and the second in j, r<sub>i</sub> and c<sub>j</sub> the row
 * and column shares, and w<sub>ij</sub> agreement weights (w<sub>ii</sub> = 1, 0 &le;
 * w<sub>ij</sub> &le; 1; the identity matrix for unweighted kappa). Then <pre>
 *   p_o = &Sigma; w_ij p_ij      p_e = &Sigma; w_ij r_i c_j      kappa = (p_o - p_e) / (1 - p_e)
 * </pre> (Cohen, J. 1960, A coefficient of agreement for nominal scales, Educational and
 * Psychological Measurement 20:37-46; weighted: Cohen 1968, Psychological Bulletin
 * 70:213-220, citation from memory). With w&#772;<sub>i.</sub> = &Sigma;<sub>j</sub>
 * c<sub>j</sub> w<sub>ij</sub> and w&#772;<sub>.j</sub> = &Sigma;<sub>i</sub>
 * r<sub>i</sub> w<sub>ij</sub>, the asymptotic variance and the variance under H0: kappa
 * = 0 are <pre>
 *   var  = [&Sigma; p_ij (w_ij - (w&#772;_i. + w&#772;_.j)(1 - kappa))&sup2; - (kappa - p_e(1 - kappa))&sup2;] / (n (1 - p_e)&sup2;)
 *   var0 = [&Sigma; r_i c_j (w_ij - (w&#772;_i. + w&#772;_.j))&sup2; - p_e&sup2;] / (n (1 - p_e)&sup2;)
 * </pre> from Fleiss, J.L., Cohen, J., Everitt, B.S. (1969), Large sample standard errors
 * of kappa and weighted kappa, Psychological Bulletin 72:323-327, in the form the SAS
 * PROC FREQ documentation prints. With identity weights they reduce to the unweighted
 * formulas of the same paper (for instance var0 = (p_e + p_e&sup2; - &Sigma; r_i c_i (r_i
 * + c_i)) / (n (1 - p_e)&sup2;)). The confidence interval is the Wald interval kappa
 * &plusmn; z&middot;SE, not clipped to [-1, 1], as SAS prints it; the test of kappa = 0
 * uses z = kappa / SE0.
 *
 * <p>
 * Kappa is 0/0, so NaN with a reason, when no item was rated by both, and when p_e = 1,
 * which for unweighted kappa means both raters put every item in the same one category.
 * Rounding can leave a variance a hair below zero (at perfect agreement it is exactly 0);
 * it is then taken as 0.
 */
public final class CohenKappa {

	private final long pairs;

	private final double observed;

	private final double expected;

	private final double kappa;

	private final double variance;

	private final double nullVariance;

	private final String whyUndefined;

	private CohenKappa(long[][] counts, double[][] weights) {
		KappaTable table = new KappaTable(counts, weights);
		this.pairs = table.total;
		this.observed = table.agreement();
		this.expected = table.chanceAgreement();
		if (table.total == 0) {
			this.whyUndefined = "No item was rated by both raters";
		}
		else if (table.chanceDisagreement() == 0) {
			this.whyUndefined = "Chance agreement is 1: both raters put every item in the same category, "
					+ "so kappa is 0/0";
		}
		else {
			this.whyUndefined = null;
		}
		this.kappa = (this.whyUndefined != null) ? Double.NaN : 1 - table.disagreement() / table.chanceDisagreement();
		this.variance = (this.whyUndefined != null) ? Double.NaN : table.variance(this.kappa);
		this.nullVariance = (this.whyUndefined != null) ? Double.NaN : table.nullVariance();
	}

	/**
	 * Unweighted kappa of a contingency table.
	 * @param counts k&times;k counts, first rater in rows, second in columns
	 * @return kappa, NaN when undefined
	 */
	public static double kappa(long[][] counts) {
		return of(counts).kappa();
	}

	/**
	 * Unweighted kappa with its standard errors.
	 * @param counts k&times;k counts, first rater in rows, second in columns
	 * @return the statistics
	 */
	public static CohenKappa of(long[][] counts) {
		return new CohenKappa(counts, KappaTable.identity(counts.length));
	}

	/**
	 * Unweighted kappa of a table built from ratings.
	 * @param table the contingency table
	 * @return the statistics
	 */
	public static CohenKappa of(ContingencyTable<?> table) {
		return of(table.counts());
	}

	/**
	 * Weighted kappa with linear weights w<sub>ij</sub> = 1 - |i - j| / (k - 1), for
	 * ordered categories (Cicchetti and Allison 1971, from memory), as SAS and
	 * statsmodels name them.
	 * @param counts k&times;k counts, first rater in rows, second in columns
	 * @return the statistics
	 */
	public static CohenKappa linearWeighted(long[][] counts) {
		int k = counts.length;
		double[][] weights = new double[k][k];
		for (int i = 0; i < k; i++) {
			for (int j = 0; j < k; j++) {
				weights[i][j] = (k == 1) ? 1 : 1 - Math.abs(i - j) / (double) (k - 1);
			}
		}
		return weighted(counts, weights);
	}

	/**
	 * Weighted kappa with agreement weights.
	 * @param counts k&times;k counts, first rater in rows, second in columns
	 * @param weights k&times;k weights, 1 on the diagonal, between 0 and 1 elsewhere
	 * @return the statistics
	 */
	public static CohenKappa weighted(long[][] counts, double[][] weights) {
		return new CohenKappa(counts, weights);
	}

	/**
	 * @return n, the number of items both raters rated
	 */
	public long pairs() {
		return this.pairs;
	}

	/**
	 * @return p_o, the (weighted) observed agreement; NaN for an empty table
	 */
	public double observedAgreement() {
		return this.observed;
	}

	/**
	 * @return p_e, the (weighted) agreement expected by chance; NaN for an empty table
	 */
	public double chanceAgreement() {
		return this.expected;
	}

	/**
	 * @return kappa, NaN when undefined (see {@link #whyUndefined()})
	 */
	public double kappa() {
		return this.kappa;
	}

	/**
	 * @return the asymptotic standard error (Fleiss, Cohen and Everitt 1969)
	 */
	public double standardError() {
		return Math.sqrt(this.variance);
	}

	/**
	 * @return the standard error under H0: kappa = 0 (Fleiss, Cohen and Everitt 1969)
	 */
	public double nullStandardError() {
		return Math.sqrt(this.nullVariance);
	}

	/**
	 * @return kappa / SE0, the statistic of the test of kappa = 0
	 */
	public double z() {
		return this.kappa / nullStandardError();
	}

	/**
	 * @return the 95% Wald interval kappa &plusmn; 1.959963984540054&middot;SE
	 */
	public ConfidenceInterval confidenceInterval() {
		return confidenceInterval(0.95);
	}

	/**
	 * The Wald interval kappa &plusmn; z&middot;SE.
	 * @param level the two-sided confidence level, between 0 and 1
	 * @return the interval, NaN bounds when kappa is undefined
	 */
	public ConfidenceInterval confidenceInterval(double level) {
		double half = NormalQuantile.twoSided(level) * standardError();
		return new ConfidenceInterval(this.kappa - half, this.kappa + half, level);
	}

	/**
	 * @return why kappa is NaN, or empty when it is defined
	 */
	public Optional<String> whyUndefined() {
		return Optional.ofNullable(this.whyUndefined);
	}

}
