package org.assay.checks;

import java.util.Arrays;
import java.util.Collection;
import java.util.EnumSet;
import java.util.Set;

/**
 * How much a draft, and a cell of drafts, needs a validator's eye: 0 (nothing to see) to
 * 1.
 *
 * <p>
 * <b>Draft:</b> with the model's confidence {@code c} and the weights {@code w} of the
 * distinct kinds of flag the draft carries ({@link FlagKind#weight()}),
 *
 * <pre>
 * risk = 1 − c · Π (1 − w)
 * </pre>
 *
 * Read it as the chance that at least one warning is right, were the model's doubt
 * {@code 1 − c} and each flag independent warnings. With no flag it is the model's doubt;
 * each flag raises it, never past 1; a kind counts once however often it was raised (two
 * near misses say little more than one). Example: confidence 0.9 and a near miss (0.3): 1
 * − 0.9 · 0.7 = 0.37; add a spike (0.5): 1 − 0.9 · 0.7 · 0.5 = 0.685.
 *
 * <p>
 * <b>Cell:</b> the mean of the {@value #TOP} highest draft risks in the cell (of all,
 * when it has fewer): a cell with several risky drafts goes before a cell with one, and
 * many quiet drafts do not dilute a risky one. An empty cell scores 0.
 *
 * <p>
 * Both are deterministic: the same flags and confidences give the same scores, whatever
 * the order.
 */
public final class RiskScore {

	/** The formula in words, as the API shows it. */
	public static final String FORMULA = "draft risk = 1 - c * product over the distinct flag kinds of (1 - weight),"
			+ " c the model's confidence clamped to 0..1; cell risk = mean of its 3 highest draft risks"
			+ " (of all, when it has fewer); an empty cell scores 0";

	/** How many of a cell's riskiest drafts its score averages. */
	public static final int TOP = 3;

	private RiskScore() {
	}

	/**
	 * The risk of one draft.
	 * @param confidence the model's confidence; values outside 0..1 are clamped
	 * @param flags the draft's flags
	 * @return the risk, 0 to 1
	 */
	public static double draft(double confidence, Collection<Flag> flags) {
		Set<FlagKind> kinds = EnumSet.noneOf(FlagKind.class);
		flags.forEach((flag) -> kinds.add(flag.kind()));
		double quiet = Math.max(0, Math.min(1, confidence));
		for (FlagKind kind : kinds) {
			quiet *= 1 - kind.weight();
		}
		return 1 - quiet;
	}

	/**
	 * The score of a cell from the risks of its drafts.
	 * @param risks the drafts' risks
	 * @return the mean of the {@value #TOP} highest, 0 for none
	 */
	public static double cell(double[] risks) {
		if (risks.length == 0) {
			return 0;
		}
		double[] sorted = risks.clone();
		Arrays.sort(sorted);
		int k = Math.min(TOP, sorted.length);
		double sum = 0;
		for (int i = sorted.length - k; i < sorted.length; i++) {
			sum += sorted[i];
		}
		return sum / k;
	}

}
