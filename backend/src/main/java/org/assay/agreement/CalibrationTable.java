package org.assay.agreement;

import java.util.ArrayList;
import java.util.List;

import org.assay.agreement.AcceptanceThreshold.Bound;
import org.assay.agreement.AcceptanceThreshold.Pool;

/**
 * The calibration of a model as validators saw it: the acceptance rate of drafts by band
 * of model confidence, each with its Wilson score interval (see {@link WilsonInterval}),
 * and the lowest confidence from which drafts are accepted at a target rate.
 *
 * <p>
 * There are B equal bands (ten by default): band b holds confidences in [b/B, (b+1)/B),
 * and the last band [(B-1)/B, 1] includes 1.0. The edges are the doubles b/B, so a
 * confidence given as 0.7 lies in the band whose lower edge is 0.7. What counts as
 * accepted is the caller's choice (for example a final verdict of ACCEPT, or of ACCEPT or
 * AMEND); drafts without a final verdict should be left out.
 *
 * <h2>The lowest threshold</h2> For each band's lower edge t, from the highest to 0, the
 * drafts with confidence &ge; t are pooled and the Wilson interval of their acceptance
 * rate computed; the edge passes when the chosen bound is &ge; the target. Edges whose
 * own band is empty are skipped: they pool the same drafts as the edge above (or none at
 * all), and would claim a threshold for confidences no draft had. The threshold is the
 * lowest edge t such that t and every higher edge not skipped pass: the scan stops at the
 * first edge that fails. So any stricter edge a lead might choose meets the target too.
 *
 * <p>
 * With the lower bound this is a fixed-sequence test (Westfall, P.H., Krishen, A. 2001,
 * Optimally weighted, fixed sequence and gatekeeper multiple testing procedures, J. of
 * Statistical Planning and Inference 99:25-40; from memory): each edge tests H0 "the rate
 * at or above t is below the target" at the one-sided level (1 - level)/2, in an order
 * fixed in advance, and goes on only after a rejection, so the chance that any edge at or
 * above the answer truly misses the target stays below (1 - level)/2 (2.5% at 95%)
 * without a correction for scanning many edges. That is also why the scan stops at the
 * first failure rather than looking further down. The price: a top band with few drafts
 * has a wide interval and can stop the scan at once (3 of 3 accepted has a lower bound of
 * 0.44); use fewer bands for small batches. With the upper bound the answer only says the
 * data do not contradict the target, and carries no such guarantee.
 */
public final class CalibrationTable {

	private final double level;

	private final int[] drafts;

	private final int[] accepted;

	private CalibrationTable(int bands, double level) {
		this.level = level;
		this.drafts = new int[bands];
		this.accepted = new int[bands];
	}

	/**
	 * Ten bands with 95% intervals.
	 * @param confidences the model confidence of each draft, in [0, 1]
	 * @param accepted whether each draft was accepted
	 * @return the table
	 */
	public static CalibrationTable of(double[] confidences, boolean[] accepted) {
		return of(confidences, accepted, 10, 0.95);
	}

	/**
	 * Equal bands with intervals at a level.
	 * @param confidences the model confidence of each draft, in [0, 1]
	 * @param accepted whether each draft was accepted
	 * @param bands the number of bands, at least 1
	 * @param level the confidence level of the intervals
	 * @return the table
	 */
	public static CalibrationTable of(double[] confidences, boolean[] accepted, int bands, double level) {
		if (confidences.length != accepted.length || bands < 1) {
			throw new IllegalArgumentException("Need one outcome per draft and at least one band");
		}
		CalibrationTable table = new CalibrationTable(bands, level);
		for (int i = 0; i < confidences.length; i++) {
			int band = table.bandOf(confidences[i]);
			table.drafts[band]++;
			table.accepted[band] += accepted[i] ? 1 : 0;
		}
		return table;
	}

	/**
	 * A table from counts already binned (for example by the database), band {@code b}
	 * holding confidences in {@code [b/n, (b+1)/n)}, the last band also 1.
	 * @param drafts the drafts in each band, lowest band first
	 * @param accepted the accepted drafts in each band
	 * @param level the confidence level of the intervals
	 * @return the table
	 */
	public static CalibrationTable ofCounts(int[] drafts, int[] accepted, double level) {
		if (drafts.length != accepted.length || drafts.length < 1) {
			throw new IllegalArgumentException("Need one count of each kind per band and at least one band");
		}
		CalibrationTable table = new CalibrationTable(drafts.length, level);
		for (int b = 0; b < drafts.length; b++) {
			if (accepted[b] < 0 || accepted[b] > drafts[b]) {
				throw new IllegalArgumentException("Band " + b + " accepts " + accepted[b] + " of " + drafts[b]);
			}
			table.drafts[b] = drafts[b];
			table.accepted[b] = accepted[b];
		}
		return table;
	}

	private int bandOf(double confidence) {
		if (!(confidence >= 0 && confidence <= 1)) {
			throw new IllegalArgumentException("A model confidence must be in [0, 1], not " + confidence);
		}
		int last = this.drafts.length - 1;
		int band = Math.min(last, (int) Math.floor(confidence * this.drafts.length));
		while (band < last && confidence >= edge(band + 1)) {
			band++;
		}
		while (band > 0 && confidence < edge(band)) {
			band--;
		}
		return band;
	}

	private double edge(int band) {
		return band / (double) this.drafts.length;
	}

	/**
	 * @return the bands, lowest confidence first
	 */
	public List<CalibrationBand> bands() {
		List<CalibrationBand> bands = new ArrayList<>();
		for (int b = 0; b < this.drafts.length; b++) {
			bands.add(new CalibrationBand(edge(b), edge(b + 1), this.drafts[b], this.accepted[b],
					WilsonInterval.of(this.accepted[b], this.drafts[b], this.level)));
		}
		return bands;
	}

	/**
	 * @return for each band's lower edge, lowest first, the drafts at or above it
	 */
	public List<Pool> atOrAbove() {
		List<Pool> pools = new ArrayList<>();
		int drafts = 0;
		int accepted = 0;
		for (int b = this.drafts.length - 1; b >= 0; b--) {
			drafts += this.drafts[b];
			accepted += this.accepted[b];
			pools.add(0, new Pool(edge(b), drafts, accepted, WilsonInterval.of(accepted, drafts, this.level)));
		}
		return pools;
	}

	/**
	 * The lowest threshold from which the acceptance rate reaches a target; see the class
	 * documentation for the exact rule.
	 * @param target the acceptance rate to reach, for example 0.95
	 * @param bound which bound of the Wilson interval must reach it
	 * @return the threshold with its pooled drafts, or why there is none
	 */
	public AcceptanceThreshold lowestThreshold(double target, Bound bound) {
		List<Pool> pools = atOrAbove();
		Pool passing = null;
		for (int b = pools.size() - 1; b >= 0; b--) {
			Pool pool = pools.get(b);
			if (this.drafts[b] == 0) {
				continue;
			}
			if (!pool.reaches(target, bound)) {
				return (passing != null) ? new AcceptanceThreshold.Met(passing) : new AcceptanceThreshold.NotMet(pool);
			}
			passing = pool;
		}
		return (passing != null) ? new AcceptanceThreshold.Met(passing) : new AcceptanceThreshold.NoDrafts();
	}

}
