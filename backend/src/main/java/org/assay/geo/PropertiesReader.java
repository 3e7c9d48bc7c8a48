package org.assay.geo;

import tools.jackson.core.JsonGenerator;
import tools.jackson.core.JsonParser;
import tools.jackson.core.JsonToken;
import tools.jackson.core.ObjectWriteContext;
import tools.jackson.core.json.JsonFactory;

/**
 * Copies a feature's {@code properties} object to compact JSON text while picking out
 * {@code kind}, {@code confidence} and {@code class}. Numbers are copied as written, so
 * {@code 0.90} stays {@code 0.90}; only whitespace goes and string escapes are
 * normalised. The copy stops as soon as it passes the size limit, so a huge properties
 * object is skipped rather than held.
 */
final class PropertiesReader {

	// One generator writes the properties of every feature, one root value after
	// another with nothing between, which saves making one per feature
	private static final JsonFactory WRITER = JsonFactory.builder().rootValueSeparator((String) null).build();

	private final JsonParser parser;

	private final BoundedBytes sink;

	private JsonGenerator out;

	PropertiesReader(JsonParser parser, int maxBytes) {
		this.parser = parser;
		this.sink = new BoundedBytes(maxBytes);
	}

	void close() {
		discardGenerator();
	}

	private void discardGenerator() {
		if (this.out != null) {
			this.out.close();
			this.out = null;
		}
	}

	/**
	 * Reads the value whose first token is current.
	 */
	void read(JsonToken first, FeatureDraft draft) {
		if (first == JsonToken.VALUE_NULL) {
			return;
		}
		if (first != JsonToken.START_OBJECT) {
			draft.fail(FeatureFault.NOT_GEOJSON, "its properties are " + Tokens.describe(first) + ", not an object");
			this.parser.skipChildren();
			return;
		}
		int outer = this.parser.streamReadContext().getNestingDepth();
		this.sink.reset();
		if (this.out == null) {
			this.out = WRITER.createGenerator(ObjectWriteContext.empty(), this.sink);
		}
		boolean copied = copy(this.out, draft);
		if (copied && this.out.streamWriteContext().inRoot()) {
			this.out.flush();
		}
		else {
			// the copy stopped inside the object: this generator cannot write the next
			// one
			discardGenerator();
		}
		skipRest(outer);
		if (!copied) {
			return;
		}
		if (this.sink.overflowed()) {
			draft.fail(FeatureFault.PROPERTIES_TOO_LARGE,
					"its properties are larger than " + this.sink.limit() + " bytes, the limit per feature");
			return;
		}
		draft.propertiesJson = this.sink.text();
	}

	/**
	 * Copies token by token, so the size limit is checked as the copy grows.
	 * @return false when the properties hold something that cannot be kept
	 */
	private boolean copy(JsonGenerator out, FeatureDraft draft) {
		String member = null;
		int depth = 0;
		JsonToken token = JsonToken.START_OBJECT;
		do {
			if (depth == 1 && token != JsonToken.PROPERTY_NAME && token != JsonToken.END_OBJECT) {
				pick(member, token, draft);
			}
			switch (token) {
				case START_OBJECT -> {
					out.writeStartObject();
					depth++;
				}
				case END_OBJECT -> {
					out.writeEndObject();
					depth--;
				}
				case START_ARRAY -> {
					out.writeStartArray();
					depth++;
				}
				case END_ARRAY -> {
					out.writeEndArray();
					depth--;
				}
				case PROPERTY_NAME -> {
					member = this.parser.currentName();
					out.writeName(member);
				}
				case VALUE_STRING -> out.writeString(this.parser.getStringCharacters(), this.parser.getStringOffset(),
						this.parser.getStringLength());
				case VALUE_NUMBER_INT, VALUE_NUMBER_FLOAT -> {
					if (this.parser.isNaN()) {
						notJson(draft, member, depth);
						return false;
					}
					out.writeNumber(this.parser.getString());
				}
				case VALUE_TRUE, VALUE_FALSE -> out.writeBoolean(token == JsonToken.VALUE_TRUE);
				default -> out.writeNull();
			}
			if (this.sink.overflowed()) {
				// the caller reports the overflow and skips the rest
				return true;
			}
			token = (depth > 0) ? this.parser.nextToken() : null;
		}
		while (depth > 0);
		return true;
	}

	/**
	 * NaN and Infinity are let through the parser for coordinates, but they cannot be
	 * kept in properties that must stay JSON.
	 */
	private void notJson(FeatureDraft draft, String member, int depth) {
		String literal = this.parser.getString();
		if (depth == 1 && "confidence".equals(member)) {
			draft.fail(FeatureFault.BAD_CONFIDENCE, "its confidence " + literal + " is not a finite number");
		}
		else {
			draft.fail(FeatureFault.NOT_GEOJSON,
					"its property " + member + " holds " + literal + ", which JSON does not allow");
		}
	}

	private void pick(String member, JsonToken token, FeatureDraft draft) {
		switch (member) {
			case "kind" -> {
				draft.kindToken = token;
				draft.kindText = (token == JsonToken.VALUE_STRING) ? this.parser.getString() : null;
			}
			case "confidence" -> {
				draft.confidenceToken = token;
				draft.confidenceText = token.isScalarValue() ? this.parser.getString() : null;
				draft.confidence = Tokens.isNumber(token) ? this.parser.getDoubleValue() : Double.NaN;
			}
			// A class that is not a string stays in the properties text only
			case "class" -> draft.featureClass = (token == JsonToken.VALUE_STRING) ? this.parser.getString() : null;
			default -> {
			}
		}
	}

	/**
	 * Leaves the parser on the closing brace of the properties object, whose nesting
	 * depth is {@code outer}, when the copy stopped early.
	 */
	private void skipRest(int outer) {
		while (this.parser.streamReadContext().getNestingDepth() >= outer) {
			if (this.parser.nextToken() == null) {
				return;
			}
		}
	}

}
