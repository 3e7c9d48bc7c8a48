package org.assay.geo;

import tools.jackson.core.JsonToken;

/**
 * Words for JSON tokens in fault messages, so that people read "a string" rather than
 * {@code VALUE_STRING}.
 */
final class Tokens {

	private Tokens() {
	}

	static String describe(JsonToken token) {
		if (token == null) {
			return "the end of the input";
		}
		return switch (token) {
			case START_OBJECT, END_OBJECT -> "an object";
			case START_ARRAY, END_ARRAY -> "an array";
			case VALUE_STRING -> "a string";
			case VALUE_NUMBER_INT, VALUE_NUMBER_FLOAT -> "a number";
			case VALUE_TRUE -> "true";
			case VALUE_FALSE -> "false";
			case VALUE_NULL -> "null";
			default -> "something else";
		};
	}

	static boolean isNumber(JsonToken token) {
		return token == JsonToken.VALUE_NUMBER_FLOAT || token == JsonToken.VALUE_NUMBER_INT;
	}

}
