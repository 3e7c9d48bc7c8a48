package org.assay.review;

import java.util.List;

import org.assay.geo.FeatureKind;
import org.junit.jupiter.api.Test;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatExceptionOfType;

/**
 * The rules a verdict must meet, one by one. The catalogue here is a small one made for
 * the test.
 */
class VerdictRulesTests {

	private static final JsonMapper JSON = JsonMapper.builder().build();

	private static final List<ReasonCode> REASONS = List.of(
			new ReasonCode(Verdict.ACCEPT, "as-drafted", "As drafted", "", "1", true, false),
			new ReasonCode(Verdict.AMEND, "geometry-adjusted", "Adjusted", "", "1", false, false),
			new ReasonCode(Verdict.REJECT, "not-a-feature", "Not real", "", "1", false, false),
			new ReasonCode(Verdict.REJECT, "old-code", "Retired", "", "2", false, true),
			new ReasonCode(Verdict.ESCALATE, "cannot-decide", "Unsure", "", "1", false, false));

	private static final String LINE = "{\"type\":\"LineString\",\"coordinates\":[[10,50],[10.001,50.001]]}";

	@Test
	void acceptWithoutAReasonTakesTheDefaultReason() {
		VerdictRules.Checked checked = check(Verdict.ACCEPT, null, null, null);
		assertThat(checked.reason().code()).isEqualTo("as-drafted");
		assertThat(checked.geometry()).isNull();
	}

	@Test
	void rejectWithoutAReasonIsRefusedBecauseItHasNoDefault() {
		assertRefused(Verdict.REJECT, null, null, null, "REJECT needs a reason code");
	}

	@Test
	void aReasonOfAnotherVerdictIsRefused() {
		assertRefused(Verdict.REJECT, "as-drafted", null, null, "is not a reason for REJECT");
	}

	@Test
	void anUnknownReasonIsRefused() {
		assertRefused(Verdict.ESCALATE, "no-such-code", null, null, "is not a reason for ESCALATE");
	}

	@Test
	void aRetiredReasonIsRefused() {
		assertRefused(Verdict.REJECT, "old-code", null, null, "retired");
	}

	@Test
	void aVerdictIsRequired() {
		assertRefused(null, null, null, null, "verdict is required");
	}

	@Test
	void amendNeedsAGeometry() {
		assertRefused(Verdict.AMEND, "geometry-adjusted", null, null, "AMEND needs the corrected geometry");
	}

	@Test
	void amendKeepsTheCorrectedGeometry() {
		VerdictRules.Checked checked = check(Verdict.AMEND, "geometry-adjusted", null, LINE);
		assertThat(checked.geometry().getGeometryType()).isEqualTo("LineString");
		assertThat(checked.geometry().getCoordinates()).hasSize(2);
	}

	@Test
	void amendWithAPolygonForARoadIsRefused() {
		assertRefused(Verdict.AMEND, "geometry-adjusted", null,
				"{\"type\":\"Polygon\",\"coordinates\":[[[0,0],[1,0],[1,1],[0,0]]]}", "not acceptable");
	}

	@Test
	void amendWithAnInvalidLineIsRefused() {
		assertRefused(Verdict.AMEND, "geometry-adjusted", null, "{\"type\":\"LineString\",\"coordinates\":[[10,50]]}",
				"not acceptable");
	}

	@Test
	void onlyAmendCarriesAGeometry() {
		assertRefused(Verdict.REJECT, "not-a-feature", null, LINE, "only AMEND carries a geometry");
	}

	@Test
	void aCommentIsTrimmedAndABlankOneDropped() {
		assertThat(check(Verdict.REJECT, "not-a-feature", "  a field edge  ", null).comment())
			.isEqualTo("a field edge");
		assertThat(check(Verdict.REJECT, "not-a-feature", "   ", null).comment()).isNull();
	}

	@Test
	void aCommentLongerThanTheLimitIsRefused() {
		assertRefused(Verdict.REJECT, "not-a-feature", "x".repeat(VerdictRules.MAX_COMMENT + 1), null,
				"comment is longer");
	}

	private static VerdictRules.Checked check(Verdict verdict, String reason, String comment, String geometry) {
		JsonNode node = (geometry != null) ? JSON.readTree(geometry) : null;
		return VerdictRules.check(new VerdictRequest(1L, verdict, reason, comment, node), FeatureKind.ROAD, REASONS);
	}

	private static void assertRefused(Verdict verdict, String reason, String comment, String geometry, String message) {
		assertThatExceptionOfType(VerdictRefused.class).isThrownBy(() -> check(verdict, reason, comment, geometry))
			.withMessageContaining(message);
	}

}
