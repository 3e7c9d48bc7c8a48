package org.assay.review;

import tools.jackson.databind.JsonNode;

/**
 * A verdict as a client sends it.
 *
 * @param draftId the draft decided on
 * @param verdict the verdict
 * @param reasonCode a reason of the batch's catalogue for that verdict (ACCEPT may omit
 * it and gets the default)
 * @param comment an optional comment, at most 2000 characters
 * @param geometry for AMEND, the corrected GeoJSON geometry; otherwise absent
 */
public record VerdictRequest(Long draftId, Verdict verdict, String reasonCode, String comment, JsonNode geometry) {
}
