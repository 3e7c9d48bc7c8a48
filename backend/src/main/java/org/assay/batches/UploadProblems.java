package org.assay.batches;

import java.util.LinkedHashMap;
import java.util.Map;

import org.assay.geo.FeatureProblem;

/**
 * RFC 9457 problem bodies for failed uploads, as maps so that they can be stored with the
 * job and returned as they are.
 */
final class UploadProblems {

	static final String NOTHING_STORED = "Nothing of the batch was stored.";

	private UploadProblems() {
	}

	static Map<String, Object> of(FeatureProblem problem, String file) {
		Map<String, Object> body = new LinkedHashMap<>();
		body.put("type", "/problems/" + problem.fault().code());
		body.put("title", "The " + file + " file is not acceptable");
		body.put("status", 422);
		body.put("detail", problem.getMessage() + ". " + NOTHING_STORED);
		body.put("file", file);
		body.put("fault", problem.fault().code());
		body.put("featureIndex", problem.index());
		body.put("featureId", problem.featureId());
		body.put("stored", false);
		return body;
	}

	static Map<String, Object> internal(Exception ex) {
		Map<String, Object> body = new LinkedHashMap<>();
		body.put("type", "about:blank");
		body.put("title", "Upload failed");
		body.put("status", 500);
		body.put("detail",
				"The upload failed on the server (" + ex.getClass().getSimpleName() + "). " + NOTHING_STORED);
		body.put("stored", false);
		return body;
	}

}
