package org.assay.review;

import java.util.List;

import org.assay.geo.FeatureKind;
import org.assay.geo.FeatureProblem;
import org.locationtech.jts.geom.Geometry;

/**
 * The rules a verdict must meet before it is stored. Plain Java, so that every rule is
 * tested on its own.
 */
final class VerdictRules {

	static final int MAX_COMMENT = 2000;

	private VerdictRules() {
	}

	/**
	 * A verdict that passed the rules.
	 *
	 * @param verdict the verdict
	 * @param reason the reason, defaulted where allowed
	 * @param comment the trimmed comment, or {@code null}
	 * @param geometry the corrected geometry for AMEND, else {@code null}
	 */
	record Checked(Verdict verdict, ReasonCode reason, String comment, Geometry geometry) {
	}

	/**
	 * Checks a verdict against the draft's kind and the batch's reasons.
	 * @param request the verdict
	 * @param kind the draft's kind
	 * @param reasons the batch's reason catalogue
	 * @return the checked verdict
	 * @throws VerdictRefused when a rule is broken
	 */
	static Checked check(VerdictRequest request, FeatureKind kind, List<ReasonCode> reasons) {
		if (request.verdict() == null) {
			throw new VerdictRefused("verdict is required: one of ACCEPT, AMEND, REJECT, ESCALATE");
		}
		ReasonCode reason = reason(request, reasons);
		String comment = (request.comment() != null && !request.comment().isBlank()) ? request.comment().strip() : null;
		if (comment != null && comment.length() > MAX_COMMENT) {
			throw new VerdictRefused("comment is longer than " + MAX_COMMENT + " characters");
		}
		boolean hasGeometry = request.geometry() != null && !request.geometry().isNull();
		if (request.verdict() == Verdict.AMEND) {
			if (!hasGeometry) {
				throw new VerdictRefused("AMEND needs the corrected geometry");
			}
			return new Checked(request.verdict(), reason, comment, amended(request, kind));
		}
		if (hasGeometry) {
			throw new VerdictRefused("only AMEND carries a geometry");
		}
		return new Checked(request.verdict(), reason, comment, null);
	}

	private static ReasonCode reason(VerdictRequest request, List<ReasonCode> reasons) {
		Verdict verdict = request.verdict();
		if (request.reasonCode() == null || request.reasonCode().isBlank()) {
			return reasons.stream()
				.filter((reason) -> reason.verdict() == verdict && reason.isDefault() && !reason.retired())
				.findFirst()
				.orElseThrow(() -> new VerdictRefused(verdict + " needs a reason code"));
		}
		ReasonCode reason = reasons.stream()
			.filter((candidate) -> candidate.verdict() == verdict && candidate.code().equals(request.reasonCode()))
			.findFirst()
			.orElseThrow(() -> new VerdictRefused(
					"reason code '" + request.reasonCode() + "' is not a reason for " + verdict + " in this batch"));
		if (reason.retired()) {
			throw new VerdictRefused("reason code '" + reason.code() + "' is retired");
		}
		return reason;
	}

	private static Geometry amended(VerdictRequest request, FeatureKind kind) {
		try {
			Geometry geometry = GeometryJson.parse(request.geometry().toString(), kind);
			if (geometry.isEmpty()) {
				throw new VerdictRefused("the corrected geometry is empty");
			}
			return geometry;
		}
		catch (FeatureProblem problem) {
			throw new VerdictRefused("the corrected geometry is not acceptable: " + problem.getMessage());
		}
	}

}
