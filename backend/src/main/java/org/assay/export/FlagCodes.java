package org.assay.export;

import java.util.LinkedHashSet;
import java.util.Set;

import tools.jackson.databind.JsonNode;
import tools.jackson.databind.ObjectMapper;

/**
 * The distinct flag codes of a draft's stored flags, as one comma-separated text: a flat
 * column that every GIS reader shows.
 */
final class FlagCodes {

	private FlagCodes() {
	}

	/**
	 * The codes of a JSON array of flags.
	 * @param json reads the array
	 * @param flags the stored flags
	 * @return for example {@code near-miss,spike}
	 */
	static String of(ObjectMapper json, String flags) {
		Set<String> codes = new LinkedHashSet<>();
		for (JsonNode flag : json.readTree(flags)) {
			codes.add(flag.path("code").asString());
		}
		return String.join(",", codes);
	}

}
