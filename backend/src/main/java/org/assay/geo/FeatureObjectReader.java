package org.assay.geo;

import tools.jackson.core.JsonParser;
import tools.jackson.core.JsonToken;

/**
 * Reads the members of one Feature object (RFC 7946 section 3.2) into a
 * {@link FeatureDraft}, in whatever order they come: {@code type}, {@code id},
 * {@code geometry}, {@code properties}; a {@code crs} member is a fault (section 4);
 * {@code bbox} and foreign members are skipped.
 */
final class FeatureObjectReader {

	private final JsonParser parser;

	private final CoordinateReader coordinates;

	private final PropertiesReader properties;

	FeatureObjectReader(JsonParser parser, CoordinateReader coordinates, PropertiesReader properties) {
		this.parser = parser;
		this.coordinates = coordinates;
		this.properties = properties;
	}

	/**
	 * Reads from the opening brace, which is the current token, through the closing one.
	 */
	void read(FeatureDraft draft) {
		for (String name = this.parser.nextName(); name != null; name = this.parser.nextName()) {
			JsonToken token = this.parser.nextToken();
			switch (name) {
				case "type" -> readType(token, draft);
				case "id" -> readId(token, draft);
				case "geometry" -> readGeometry(token, draft);
				case "properties" -> this.properties.read(token, draft);
				case "crs" -> crs(draft, "the feature");
				default -> this.parser.skipChildren();
			}
		}
	}

	private void readType(JsonToken token, FeatureDraft draft) {
		draft.typeSeen = true;
		String type = (token == JsonToken.VALUE_STRING) ? this.parser.getString() : null;
		if (!"Feature".equals(type)) {
			draft.fail(FeatureFault.NOT_GEOJSON,
					"its type is " + ((type != null) ? "\"" + type + "\"" : Tokens.describe(token))
							+ "; each member of features must be a Feature");
			this.parser.skipChildren();
		}
	}

	/** RFC 7946 section 3.2: an id is a string or a number; Assay keeps it as text. */
	private void readId(JsonToken token, FeatureDraft draft) {
		if (token == JsonToken.VALUE_STRING || Tokens.isNumber(token)) {
			draft.id = this.parser.getString();
		}
		else if (token != JsonToken.VALUE_NULL) {
			draft.fail(FeatureFault.NOT_GEOJSON,
					"its id is " + Tokens.describe(token) + "; an id must be a string or a number");
			this.parser.skipChildren();
		}
	}

	private void readGeometry(JsonToken token, FeatureDraft draft) {
		draft.geometrySeen = true;
		draft.geometryType = null;
		draft.coordinates.clear();
		if (token == JsonToken.VALUE_NULL) {
			draft.geometryNull = true;
			return;
		}
		draft.geometryNull = false;
		if (token != JsonToken.START_OBJECT) {
			draft.fail(FeatureFault.NOT_GEOJSON, "its geometry is " + Tokens.describe(token) + ", not an object");
			this.parser.skipChildren();
			return;
		}
		for (String name = this.parser.nextName(); name != null; name = this.parser.nextName()) {
			JsonToken value = this.parser.nextToken();
			switch (name) {
				case "type" -> readGeometryType(value, draft);
				case "coordinates" -> this.coordinates.read(value, draft.coordinates);
				case "crs" -> crs(draft, "the geometry");
				default -> this.parser.skipChildren();
			}
		}
	}

	private void readGeometryType(JsonToken token, FeatureDraft draft) {
		if (token == JsonToken.VALUE_STRING) {
			draft.geometryType = this.parser.getString();
		}
		else {
			draft.fail(FeatureFault.WRONG_GEOMETRY_TYPE,
					"its geometry type is " + Tokens.describe(token) + ", not the name of a type");
			this.parser.skipChildren();
		}
	}

	private void crs(FeatureDraft draft, String where) {
		draft.fail(FeatureFault.CRS_MEMBER, where + " has a crs member; RFC 7946 removed it, because "
				+ "coordinates are always WGS84 longitude and latitude");
		this.parser.skipChildren();
	}

}
