package org.assay.agreement;

import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * A seeded simulation: two validators of known accuracy rate drafts whose true categories
 * follow a known distribution. The 95% interval of {@link CohenKappa} (Fleiss, Cohen and
 * Everitt 1969) should contain the kappa those accuracies imply in about 95% of studies.
 *
 * <p>
 * The model: a draft's true category is c with probability &pi;<sub>c</sub>; validator v
 * gives c with probability a<sub>v</sub>, otherwise one of the other k - 1 categories
 * uniformly, independently of the other validator. Then (derivation) <pre>
 *   p_o = a1 a2 + (1 - a1)(1 - a2)/(k - 1)
 *   r_i = &pi;_i a1 + (1 - &pi;_i)(1 - a1)/(k - 1),   c_i likewise with a2
 *   p_e = &Sigma; r_i c_i,   kappa = (p_o - p_e) / (1 - p_e)
 * </pre> the population kappa, which each study's interval should cover. Tolerance: with
 * 2,000 studies the Monte Carlo standard deviation of the coverage is
 * &radic;(0.95&middot;0.05 / 2000) = 0.49 percentage points; the accepted band 93-97% is
 * about four of them either side, leaving room for the small-sample error of an
 * asymptotic interval at n = 250.
 */
class CohenKappaSimulationTests {

	private static final double[] PREVALENCE = { 0.55, 0.20, 0.15, 0.10 };

	private static final double ACCURACY_1 = 0.90;

	private static final double ACCURACY_2 = 0.80;

	private static final int DRAFTS = 250;

	private static final int STUDIES = 2000;

	@Test
	void theIntervalCoversTheKappaImpliedByTheAccuraciesInAbout95PercentOfStudies() {
		double expected = impliedKappa();
		SplittableRandom random = new SplittableRandom(20240517L);
		int covered = 0;
		double sum = 0;
		for (int study = 0; study < STUDIES; study++) {
			CohenKappa kappa = CohenKappa.of(simulateStudy(random));
			sum += kappa.kappa();
			if (kappa.confidenceInterval().contains(expected)) {
				covered++;
			}
		}
		// this seed gives 0.9375; 40,000 studies with the same model give 0.949
		assertThat(covered / (double) STUDIES).as("coverage of the 95%% interval").isBetween(0.93, 0.97);
		// the mean estimate is within a few Monte Carlo errors (about 0.001) of the truth
		assertThat(sum / STUDIES).isCloseTo(expected, within(0.01));
	}

	@Test
	void theImpliedKappaFollowsFromTheModel() {
		// derivation, by hand: p_o = 0.72 + 0.02/3 = 0.726667; r = (0.51, 0.2067, 0.1633,
		// 0.12), c = (0.47, 0.2133, 0.1767, 0.14); p_e = 0.329444, kappa = 0.59238
		assertThat(impliedKappa()).isCloseTo(0.59238, within(1e-5));
	}

	private static double impliedKappa() {
		int k = PREVALENCE.length;
		double po = ACCURACY_1 * ACCURACY_2 + (1 - ACCURACY_1) * (1 - ACCURACY_2) / (k - 1);
		double pe = 0;
		for (double prevalence : PREVALENCE) {
			double r = prevalence * ACCURACY_1 + (1 - prevalence) * (1 - ACCURACY_1) / (k - 1);
			double c = prevalence * ACCURACY_2 + (1 - prevalence) * (1 - ACCURACY_2) / (k - 1);
			pe += r * c;
		}
		return (po - pe) / (1 - pe);
	}

	private static long[][] simulateStudy(SplittableRandom random) {
		int k = PREVALENCE.length;
		long[][] counts = new long[k][k];
		for (int draft = 0; draft < DRAFTS; draft++) {
			int truth = draw(random);
			counts[rate(random, truth, ACCURACY_1)][rate(random, truth, ACCURACY_2)]++;
		}
		return counts;
	}

	private static int draw(SplittableRandom random) {
		double u = random.nextDouble();
		int category = 0;
		while (category < PREVALENCE.length - 1 && u >= PREVALENCE[category]) {
			u -= PREVALENCE[category];
			category++;
		}
		return category;
	}

	private static int rate(SplittableRandom random, int truth, double accuracy) {
		if (random.nextDouble() < accuracy) {
			return truth;
		}
		int other = random.nextInt(PREVALENCE.length - 1);
		return (other < truth) ? other : other + 1;
	}

}
