package org.assay.reports;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import org.assay.agreement.AcceptanceThreshold;
import org.assay.agreement.CalibrationBand;
import org.assay.agreement.CalibrationTable;
import org.assay.agreement.CohenKappa;
import org.assay.agreement.ConfidenceInterval;
import org.assay.agreement.FleissKappa;
import org.assay.agreement.KrippendorffAlpha;
import org.assay.agreement.LandisKochBand;
import org.assay.agreement.WilsonInterval;

import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.jdbc.core.RowCallbackHandler;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

/**
 * Agreement between validators and calibration of the model for one batch, from the
 * standing verdicts of each review pass. Each figure names its statistic; the statistics
 * and their sources are documented in {@code org.assay.agreement}.
 */
@Service
class AgreementReport {

	/** The verdict categories, in the order of the tables. */
	static final List<String> VERDICTS = List.of("ACCEPT", "AMEND", "REJECT", "ESCALATE");

	private static final String KEEP_OR_DROP = "keep (ACCEPT or AMEND) against drop (REJECT); ESCALATE left out";

	private final JdbcTemplate jdbc;

	AgreementReport(JdbcTemplate jdbc) {
		this.jdbc = jdbc;
	}

	/** A validator's numbers against the final verdicts. */
	record ValidatorRow(long id, String username, long reviewed, long agreedWithFinal, long ruled,
			long agreedWithRuling, long drops, long dropsUpheld) {
	}

	/** A pair of validators and their tables, the lower account id first. */
	record PairRow(long firstId, String first, long secondId, String second, long[][] counts) {
	}

	/**
	 * The agreement of the validator pairs of a batch, over the drafts both passes
	 * decided in the window (by the later of the two verdicts).
	 */
	@Transactional(readOnly = true)
	List<PairRow> pairs(long batchId, ReportWindow window) {
		Map<String, PairRow> pairs = new TreeMap<>();
		List<Object> args = new ArrayList<>(List.of(batchId));
		args.addAll(List.of(window.arguments()));
		this.jdbc.query("select p1.validator_id, u1.username, p1.verdict, p2.validator_id, u2.username, p2.verdict,"
				+ " count(*) from pass_verdict p1"
				+ " join pass_verdict p2 on p2.draft_id = p1.draft_id and p2.review_pass = 2"
				+ " join app_user u1 on u1.id = p1.validator_id join app_user u2 on u2.id = p2.validator_id"
				+ " where p1.batch_id = ? and p1.review_pass = 1"
				+ window.condition("greatest(p1.decided_at, p2.decided_at)")
				+ " group by p1.validator_id, u1.username, p1.verdict, p2.validator_id, u2.username, p2.verdict",
				(RowCallbackHandler) (rs) -> {
					long a = rs.getLong(1);
					long b = rs.getLong(4);
					String nameA = rs.getString(2);
					String nameB = rs.getString(5);
					boolean swap = b < a;
					long lo = swap ? b : a;
					long hi = swap ? a : b;
					String key = String.format("%019d-%019d", lo, hi);
					PairRow pair = pairs.computeIfAbsent(key, (k) -> new PairRow(lo, swap ? nameB : nameA, hi,
							swap ? nameA : nameB, new long[VERDICTS.size()][VERDICTS.size()]));
					int i = VERDICTS.indexOf(rs.getString(swap ? 6 : 3));
					int j = VERDICTS.indexOf(rs.getString(swap ? 3 : 6));
					pair.counts()[i][j] += rs.getLong(7);
				}, args.toArray());
		return new ArrayList<>(pairs.values());
	}

	/**
	 * Each validator's verdicts on drafts reviewed twice or ruled, against the final
	 * verdict.
	 */
	@Transactional(readOnly = true)
	List<ValidatorRow> validators(long batchId, ReportWindow window) {
		Map<Long, long[]> sums = new TreeMap<>();
		Map<Long, String> names = new TreeMap<>();
		List<Object> args = new ArrayList<>(List.of(batchId));
		args.addAll(List.of(window.arguments()));
		this.jdbc.query("select p.validator_id, u.username, p.verdict, c.verdict,"
				+ " case when r.draft_id is null then 0 else 1 end, count(*) from pass_verdict p"
				+ " join current_verdict c on c.draft_id = p.draft_id join app_user u on u.id = p.validator_id"
				+ " left join pass_verdict r on r.draft_id = p.draft_id and r.review_pass = 0"
				+ " where p.batch_id = ? and p.review_pass in (1, 2)" + window.condition("p.decided_at")
				+ " and (r.draft_id is not null or exists (select 1 from pass_verdict q where q.draft_id = p.draft_id"
				+ " and q.review_pass = 3 - p.review_pass))"
				+ " group by p.validator_id, u.username, p.verdict, c.verdict,"
				+ " case when r.draft_id is null then 0 else 1 end", (RowCallbackHandler) (rs) -> {
					long id = rs.getLong(1);
					names.put(id, rs.getString(2));
					long[] s = sums.computeIfAbsent(id, (k) -> new long[6]);
					boolean agreed = rs.getString(3).equals(rs.getString(4));
					boolean ruled = rs.getInt(5) == 1;
					boolean drop = "REJECT".equals(rs.getString(3));
					long n = rs.getLong(6);
					s[0] += n;
					s[1] += agreed ? n : 0;
					s[2] += ruled ? n : 0;
					s[3] += (ruled && agreed) ? n : 0;
					s[4] += (ruled && drop) ? n : 0;
					s[5] += (ruled && drop && agreed) ? n : 0;
				}, args.toArray());
		List<ValidatorRow> rows = new ArrayList<>();
		sums.forEach((id, s) -> rows.add(new ValidatorRow(id, names.get(id), s[0], s[1], s[2], s[3], s[4], s[5])));
		return rows;
	}

	/** The whole agreement report of a batch. */
	@Transactional(readOnly = true)
	Map<String, Object> agreement(long batchId, ReportWindow window) {
		List<PairRow> pairs = pairs(batchId, window);
		Map<String, Object> body = new LinkedHashMap<>();
		body.put("batchId", batchId);
		body.put("from", window.from());
		body.put("to", window.to());
		body.put("categories", VERDICTS);
		body.put("pairs", pairs.stream().map(AgreementReport::pairView).toList());
		body.put("team", team(pairs));
		body.put("validators", validators(batchId, window).stream().map(AgreementReport::validatorView).toList());
		return body;
	}

	private static Map<String, Object> pairView(PairRow pair) {
		Map<String, Object> row = new LinkedHashMap<>();
		row.put("first", pair.first());
		row.put("second", pair.second());
		row.put("table", pair.counts());
		row.put("verdicts", kappaView(CohenKappa.of(pair.counts())));
		row.put("keepOrDrop", kappaView(CohenKappa.of(keepOrDrop(pair.counts()))));
		return row;
	}

	/** The 2 x 2 keep/drop table of a verdict table. */
	static long[][] keepOrDrop(long[][] counts) {
		long[][] out = new long[2][2];
		for (int i = 0; i < 3; i++) {
			for (int j = 0; j < 3; j++) {
				out[(i < 2) ? 0 : 1][(j < 2) ? 0 : 1] += counts[i][j];
			}
		}
		return out;
	}

	static Map<String, Object> kappaView(CohenKappa kappa) {
		Map<String, Object> view = new LinkedHashMap<>();
		view.put("statistic", "Cohen's kappa, standard errors of Fleiss, Cohen and Everitt (1969)");
		view.put("drafts", kappa.pairs());
		view.put("observedAgreement", finite(kappa.observedAgreement()));
		view.put("chanceAgreement", finite(kappa.chanceAgreement()));
		view.put("kappa", finite(kappa.kappa()));
		view.put("standardError", finite(kappa.standardError()));
		ConfidenceInterval ci = kappa.confidenceInterval();
		view.put("ci95", Double.isFinite(ci.lower()) ? List.of(ci.lower(), ci.upper()) : null);
		view.put("band", Double.isFinite(kappa.kappa()) ? LandisKochBand.of(kappa.kappa()).label() : null);
		view.put("undefined", kappa.whyUndefined().orElse(null));
		return view;
	}

	private static Map<String, Object> team(List<PairRow> pairs) {
		// every double-reviewed draft is one subject with two ratings
		List<int[]> subjects = new ArrayList<>();
		List<List<String>> units = new ArrayList<>();
		for (PairRow pair : pairs) {
			for (int i = 0; i < VERDICTS.size(); i++) {
				for (int j = 0; j < VERDICTS.size(); j++) {
					for (long n = 0; n < pair.counts()[i][j]; n++) {
						int[] row = new int[VERDICTS.size()];
						row[i]++;
						row[j]++;
						subjects.add(row);
						units.add(List.of(VERDICTS.get(i), VERDICTS.get(j)));
					}
				}
			}
		}
		Map<String, Object> team = new LinkedHashMap<>();
		team.put("drafts", subjects.size());
		Map<String, Object> fleiss = new LinkedHashMap<>();
		fleiss.put("statistic", "Fleiss' kappa (1971), null standard error of Fleiss, Nee and Landis (1979);"
				+ " two ratings per draft");
		Map<String, Object> alpha = new LinkedHashMap<>();
		alpha.put("statistic", "Krippendorff's alpha, nominal");
		if (!subjects.isEmpty()) {
			FleissKappa f = FleissKappa.of(subjects.toArray(int[][]::new));
			fleiss.put("kappa", finite(f.kappa()));
			fleiss.put("nullStandardError", finite(f.nullStandardError()));
			fleiss.put("band", Double.isFinite(f.kappa()) ? LandisKochBand.of(f.kappa()).label() : null);
			fleiss.put("undefined", f.whyUndefined().orElse(null));
			KrippendorffAlpha a = KrippendorffAlpha.ofNominal(units);
			alpha.put("alpha", finite(a.alpha()));
			alpha.put("pairableValues", a.pairableValues());
			alpha.put("undefined", a.whyUndefined().orElse(null));
		}
		team.put("fleiss", fleiss);
		team.put("krippendorffAlpha", alpha);
		return team;
	}

	private static Map<String, Object> validatorView(ValidatorRow row) {
		Map<String, Object> view = new LinkedHashMap<>();
		view.put("validator", row.username());
		view.put("reviewed", row.reviewed());
		view.put("agreedWithFinal", row.agreedWithFinal());
		view.put("agreementWithFinal", share(row.agreedWithFinal(), row.reviewed()));
		view.put("ruled", row.ruled());
		view.put("overturned", row.ruled() - row.agreedWithRuling());
		view.put("overturnedShare", share(row.ruled() - row.agreedWithRuling(), row.ruled()));
		view.put("drops", row.drops());
		view.put("dropsUpheld", row.dropsUpheld());
		view.put("dropsUpheldShare", share(row.dropsUpheld(), row.drops()));
		return view;
	}

	/** A share with its Wilson score 95% interval, or null without trials. */
	static Map<String, Object> share(long successes, long trials) {
		if (trials == 0) {
			return null;
		}
		ConfidenceInterval ci = WilsonInterval.of(successes, trials);
		Map<String, Object> view = new LinkedHashMap<>();
		view.put("value", successes / (double) trials);
		view.put("ci95", List.of(ci.lower(), ci.upper()));
		view.put("interval", "Wilson score");
		return view;
	}

	/**
	 * The model's calibration: the share of final verdicts that kept the draft (ACCEPT or
	 * AMEND; with {@code asDrafted} only ACCEPT) by confidence band, and the lowest
	 * confidence from which that share reaches a target.
	 */
	@Transactional(readOnly = true)
	Map<String, Object> calibration(long batchId, ReportWindow window, int bands, double target,
			AcceptanceThreshold.Bound bound, boolean asDrafted) {
		int[] drafts = new int[bands];
		int[] accepted = new int[bands];
		List<Object> args = new ArrayList<>(List.of(bands, bands - 1, batchId));
		args.addAll(List.of(window.arguments()));
		String kept = asDrafted ? "('ACCEPT')" : "('ACCEPT', 'AMEND')";
		this.jdbc.query("select band, count(*), sum(kept) from (select least(cast(floor(d.confidence * ?) as int), ?)"
				+ " as band, case when c.verdict in " + kept + " then 1 else 0 end as kept"
				+ " from current_verdict c join draft d on d.id = c.draft_id where c.batch_id = ?"
				+ " and c.verdict <> 'ESCALATE'" + window.condition("c.decided_at")
				+ " and not exists (select 1 from ruling_case r where r.draft_id = c.draft_id and r.ruled_at is null)"
				+ ") t group by band", (RowCallbackHandler) (rs) -> {
					int band = Math.max(0, rs.getInt(1));
					drafts[band] += rs.getInt(2);
					accepted[band] += rs.getInt(3);
				}, args.toArray());
		CalibrationTable table = CalibrationTable.ofCounts(drafts, accepted, 0.95);
		Map<String, Object> body = new LinkedHashMap<>();
		body.put("batchId", batchId);
		body.put("from", window.from());
		body.put("to", window.to());
		body.put("outcome", asDrafted ? "ACCEPT" : "ACCEPT or AMEND");
		body.put("interval", "Wilson score, 95%");
		List<Map<String, Object>> rows = new ArrayList<>();
		for (CalibrationBand band : table.bands()) {
			Map<String, Object> row = new LinkedHashMap<>();
			row.put("lower", band.lower());
			row.put("upper", band.upper());
			row.put("drafts", band.drafts());
			row.put("accepted", band.accepted());
			row.put("rate", finite(band.rate()));
			row.put("ci95", (band.drafts() > 0) ? List.of(band.interval().lower(), band.interval().upper()) : null);
			rows.add(row);
		}
		body.put("bands", rows);
		Map<String, Object> threshold = new LinkedHashMap<>();
		threshold.put("target", target);
		threshold.put("bound", bound.name().toLowerCase(java.util.Locale.ROOT));
		AcceptanceThreshold found = table.lowestThreshold(target, bound);
		threshold.put("met", found.met());
		if (found instanceof AcceptanceThreshold.Met met) {
			threshold.put("confidence", met.threshold());
			threshold.put("pool", poolView(met.pool()));
		}
		else if (found instanceof AcceptanceThreshold.NotMet notMet) {
			threshold.put("highestPool", poolView(notMet.highest()));
		}
		body.put("threshold", threshold);
		return body;
	}

	private static Map<String, Object> poolView(AcceptanceThreshold.Pool pool) {
		Map<String, Object> view = new LinkedHashMap<>();
		view.put("atOrAbove", pool.threshold());
		view.put("drafts", pool.drafts());
		view.put("accepted", pool.accepted());
		view.put("rate", finite(pool.rate()));
		view.put("ci95", List.of(pool.interval().lower(), pool.interval().upper()));
		return view;
	}

	private static Double finite(double value) {
		return Double.isFinite(value) ? value : null;
	}

}
