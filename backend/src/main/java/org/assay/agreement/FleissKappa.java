package org.assay.agreement;

import java.util.Optional;

/**
 * Fleiss' kappa for N subjects each rated by the same number n &ge; 2 of raters (not
 * necessarily the same raters) into k categories, from the count n<sub>ij</sub> of raters
 * who put subject i in category j.
 *
 * <p>
 * From Fleiss, J.L. (1971), Measuring nominal scale agreement among many raters,
 * Psychological Bulletin 76:378-382: <pre>
 *   p_j = &Sigma;_i n_ij / (N n),  q_j = 1 - p_j
 *   P_i = (&Sigma;_j n_ij&sup2; - n) / (n (n - 1)),  P&#772; = &Sigma;_i P_i / N,  P&#772;_e = &Sigma;_j p_j&sup2;
 *   kappa = (P&#772; - P&#772;_e) / (1 - P&#772;_e)
 *   kappa_j = 1 - &Sigma;_i n_ij (n - n_ij) / (N n (n - 1) p_j q_j)      (category j against the rest)
 * </pre> and kappa = &Sigma; p_j q_j kappa_j / &Sigma; p_j q_j.
 *
 * <p>
 * The variance under H0 (agreement no better than chance) is the corrected one of Fleiss,
 * J.L., Nee, J.C.M., Landis, J.R. (1979), Large sample variance of kappa in the case of
 * different sets of raters, Psychological Bulletin 86:974-977 (citation from memory):
 * <pre>
 *   var0(kappa)   = 2 / (N n (n - 1)) &middot; [(&Sigma; p_j q_j)&sup2; - &Sigma; p_j q_j (q_j - p_j)] / (&Sigma; p_j q_j)&sup2;
 *   var0(kappa_j) = 2 / (N n (n - 1))
 * </pre> The 1971 paper printed var0(kappa) = 2/(N n (n-1)) &middot; [P&#772;_e - (2n -
 * 3) P&#772;_e&sup2; + 2(n - 2) &Sigma; p_j&sup3;] / (1 - P&#772;_e)&sup2;, which the
 * 1979 paper showed to be wrong; the two differ (for the 30 &times; 6 example of the 1971
 * paper, z = 15.64 against 17.65). The corrected formula is the one the R package irr
 * (kappam.fleiss, since version 0.6) prints: z = 17.65183 for that example. These
 * variances hold only under H0, so they give a test of kappa = 0 and no confidence
 * interval.
 *
 * <p>
 * With n = 2 this is Scott's pi, not Cohen's kappa: chance agreement uses the pooled
 * category shares of both raters. Kappa is NaN, with a reason, when every rating is in
 * one category (P&#772;_e = 1); kappa_j is NaN for a category nobody or everybody used.
 */
public final class FleissKappa {

	private final int subjects;

	private final int raters;

	private final double[] shares;

	private final double meanAgreement;

	private final double[] categoryKappas;

	private FleissKappa(int[][] counts) {
		this.subjects = counts.length;
		this.raters = ratersOf(counts);
		int k = counts[0].length;
		double ratings = (double) this.subjects * this.raters;
		double pairs = ratings * (this.raters - 1);
		long[] totals = new long[k];
		double[] disagreements = new double[k];
		double agreement = 0;
		for (int[] subject : counts) {
			double squares = 0;
			for (int j = 0; j < k; j++) {
				totals[j] += subject[j];
				disagreements[j] += subject[j] * (double) (this.raters - subject[j]);
				squares += subject[j] * (double) subject[j];
			}
			agreement += (squares - this.raters) / (this.raters * (this.raters - 1.0));
		}
		this.meanAgreement = agreement / this.subjects;
		this.shares = new double[k];
		for (int j = 0; j < k; j++) {
			this.shares[j] = totals[j] / ratings;
		}
		this.categoryKappas = new double[k];
		for (int j = 0; j < k; j++) {
			double pq = this.shares[j] * (1 - this.shares[j]);
			this.categoryKappas[j] = (pq > 0) ? 1 - disagreements[j] / (pairs * pq) : Double.NaN;
		}
	}

	/**
	 * Fleiss' kappa of a subjects &times; categories table of counts.
	 * @param counts for each subject, the number of raters who chose each category
	 * @return kappa, NaN when every rating is in one category
	 */
	public static double kappa(int[][] counts) {
		return of(counts).kappa();
	}

	/**
	 * Fleiss' kappa with its per-category kappas and null standard errors.
	 * @param counts for each subject, the number of raters who chose each category; every
	 * row must have the same sum n &ge; 2
	 * @return the statistics
	 */
	public static FleissKappa of(int[][] counts) {
		return new FleissKappa(counts);
	}

	private static int ratersOf(int[][] counts) {
		if (counts.length == 0 || counts[0].length == 0) {
			throw new IllegalArgumentException("Fleiss' kappa needs at least one subject and one category");
		}
		int raters = -1;
		for (int[] subject : counts) {
			int sum = 0;
			for (int count : subject) {
				if (count < 0) {
					throw new IllegalArgumentException("Counts must not be negative, not " + count);
				}
				sum += count;
			}
			if (subject.length != counts[0].length || (raters >= 0 && sum != raters)) {
				throw new IllegalArgumentException("Every subject must have the same number of ratings "
						+ "in the same categories; use Krippendorff's alpha for missing ratings");
			}
			raters = sum;
		}
		if (raters < 2) {
			throw new IllegalArgumentException("Each subject needs at least two ratings, not " + raters);
		}
		return raters;
	}

	/**
	 * @return N
	 */
	public int subjects() {
		return this.subjects;
	}

	/**
	 * @return n, the ratings per subject
	 */
	public int raters() {
		return this.raters;
	}

	/**
	 * The share of all ratings in a category.
	 * @param category j, from 0
	 * @return p_j
	 */
	public double share(int category) {
		return this.shares[category];
	}

	/**
	 * @return P&#772;, the mean agreement among pairs of ratings of a subject
	 */
	public double meanAgreement() {
		return this.meanAgreement;
	}

	/**
	 * @return P&#772;_e = &Sigma; p_j&sup2;
	 */
	public double chanceAgreement() {
		double sum = 0;
		for (double p : this.shares) {
			sum += p * p;
		}
		return sum;
	}

	/**
	 * @return kappa, NaN when undefined (see {@link #whyUndefined()})
	 */
	public double kappa() {
		double spread = spread();
		return (spread > 0) ? (this.meanAgreement - chanceAgreement()) / spread : Double.NaN;
	}

	/**
	 * Kappa for one category against all others pooled.
	 * @param category j, from 0
	 * @return kappa_j, NaN for a category with p_j = 0 or 1
	 */
	public double categoryKappa(int category) {
		return this.categoryKappas[category];
	}

	/**
	 * @return the standard error of kappa under H0 (Fleiss, Nee and Landis 1979)
	 */
	public double nullStandardError() {
		double spread = spread();
		if (!(spread > 0)) {
			return Double.NaN;
		}
		double skew = 0;
		for (double p : this.shares) {
			skew += p * (1 - p) * (1 - 2 * p);
		}
		return Math.sqrt(2 / pairsOfRatings() * (spread * spread - skew) / (spread * spread));
	}

	/**
	 * @return the standard error of each kappa_j under H0, the same for every category
	 */
	public double categoryNullStandardError() {
		return Math.sqrt(2 / pairsOfRatings());
	}

	/**
	 * @return kappa / SE0, the statistic of the test of kappa = 0
	 */
	public double z() {
		return kappa() / nullStandardError();
	}

	/**
	 * @return why kappa is NaN, or empty when it is defined
	 */
	public Optional<String> whyUndefined() {
		return (spread() > 0) ? Optional.empty()
				: Optional.of("Every rating is in one category, so chance agreement is 1 and kappa is 0/0");
	}

	/**
	 * 1 - P&#772;_e, summed as &Sigma; p_j q_j so that it is exactly 0 for one category.
	 */
	private double spread() {
		double sum = 0;
		for (double p : this.shares) {
			sum += p * (1 - p);
		}
		return sum;
	}

	private double pairsOfRatings() {
		return (double) this.subjects * this.raters * (this.raters - 1);
	}

}
