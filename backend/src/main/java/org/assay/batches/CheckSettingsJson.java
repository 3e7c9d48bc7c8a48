package org.assay.batches;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.assay.checks.CheckSettings;
import tools.jackson.core.JacksonException;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.ObjectMapper;
import tools.jackson.databind.node.ObjectNode;

/**
 * A batch's check settings as JSON: what a lead sends is laid over the defaults, so that
 * {@code {"nearMiss": {"maxGapMetres": 6}}} changes one threshold and {@code {"crossing":
 * {"enabled": false}}} switches one check off. A name that is not a setting is refused
 * rather than ignored, so that a misspelt threshold cannot pass unnoticed. Stored with
 * every threshold spelled out.
 */
final class CheckSettingsJson {

	private final ObjectMapper json;

	CheckSettingsJson(ObjectMapper json) {
		this.json = json;
	}

	/**
	 * Reads settings.
	 * @param text JSON laid over the defaults, or {@code null} or blank for the defaults
	 * @return the settings
	 * @throws IllegalArgumentException saying which setting is wrong and why
	 */
	CheckSettings read(String text) {
		if (text == null || text.isBlank()) {
			return CheckSettings.DEFAULTS;
		}
		JsonNode given;
		try {
			given = this.json.readTree(text);
		}
		catch (JacksonException ex) {
			throw new IllegalArgumentException("checks is not valid JSON: " + ex.getOriginalMessage());
		}
		if (!given.isObject()) {
			throw new IllegalArgumentException("checks must be a JSON object");
		}
		ObjectNode merged = this.json.valueToTree(CheckSettings.DEFAULTS);
		lay((ObjectNode) given, merged, "checks");
		try {
			return this.json.treeToValue(merged, CheckSettings.class);
		}
		catch (JacksonException ex) {
			Throwable cause = ex.getCause();
			String reason = (cause instanceof IllegalArgumentException) ? cause.getMessage() : ex.getOriginalMessage();
			throw new IllegalArgumentException("checks: " + reason);
		}
	}

	/**
	 * Writes settings with every threshold.
	 * @param settings the settings
	 * @return JSON
	 */
	String write(CheckSettings settings) {
		return this.json.writeValueAsString(settings);
	}

	private static void lay(ObjectNode given, ObjectNode target, String path) {
		for (Map.Entry<String, JsonNode> entry : given.properties()) {
			String name = entry.getKey();
			JsonNode value = entry.getValue();
			JsonNode existing = target.get(name);
			String where = path + "." + name;
			if (existing == null) {
				List<String> known = new ArrayList<>();
				target.propertyNames().forEach(known::add);
				throw new IllegalArgumentException(where + " is not a setting; known here: " + known);
			}
			if (existing.isObject()) {
				if (!value.isObject()) {
					throw new IllegalArgumentException(where + " must be a JSON object");
				}
				lay((ObjectNode) value, (ObjectNode) existing, where);
			}
			else if (existing.isBoolean()) {
				if (!value.isBoolean()) {
					throw new IllegalArgumentException(where + " must be true or false, not " + value);
				}
				target.set(name, value);
			}
			else {
				if (!value.isNumber()) {
					throw new IllegalArgumentException(where + " must be a number, not " + value);
				}
				target.set(name, value);
			}
		}
	}

}
