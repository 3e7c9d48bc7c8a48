package org.assay.geo;

import tools.jackson.core.JsonParser;
import tools.jackson.core.JsonToken;
import tools.jackson.core.TokenStreamLocation;
import tools.jackson.core.exc.StreamReadException;

/**
 * Reads the members of the FeatureCollection object around the features (RFC 7946 section
 * 3.3): {@code type} must be "FeatureCollection", {@code features} an array; {@code crs}
 * is a fault (section 4); {@code bbox}, names and other foreign members are skipped,
 * before or after the features. Document faults have index -1.
 */
final class CollectionReader {

	private final JsonParser parser;

	private String type;

	private boolean typeSeen;

	private boolean featuresSeen;

	CollectionReader(JsonParser parser) {
		this.parser = parser;
	}

	/** Reads the opening brace of the document. */
	void start() {
		JsonToken token = this.parser.nextToken();
		if (token != JsonToken.START_OBJECT) {
			throw problem(FeatureFault.NOT_GEOJSON, (token == null) ? "The input is empty"
					: "The input is " + Tokens.describe(token) + ", not a GeoJSON FeatureCollection object");
		}
	}

	/**
	 * Reads members up to the opening bracket of {@code features}.
	 * @return true when the parser is at the start of the features, false at the end of
	 * the collection object
	 */
	boolean seekFeatures() {
		for (String name = this.parser.nextName(); name != null; name = this.parser.nextName()) {
			JsonToken token = this.parser.nextToken();
			switch (name) {
				case "type" -> readType(token);
				case "crs" -> throw problem(FeatureFault.CRS_MEMBER, "The FeatureCollection has a crs member; "
						+ "RFC 7946 removed it, because coordinates are always WGS84 longitude and latitude");
				case "features" -> {
					if (this.featuresSeen) {
						throw problem(FeatureFault.NOT_GEOJSON, "The FeatureCollection has two features members");
					}
					if (token != JsonToken.START_ARRAY) {
						throw problem(FeatureFault.NOT_GEOJSON,
								"The features member is " + Tokens.describe(token) + ", not an array");
					}
					this.featuresSeen = true;
					return true;
				}
				default -> this.parser.skipChildren();
			}
		}
		return false;
	}

	private void readType(JsonToken token) {
		this.typeSeen = true;
		this.type = (token == JsonToken.VALUE_STRING) ? this.parser.getString() : null;
		if ("Feature".equals(this.type)) {
			throw problem(FeatureFault.NOT_GEOJSON,
					"The input is a single Feature; it must be a FeatureCollection holding the features");
		}
		if (!"FeatureCollection".equals(this.type)) {
			throw problem(FeatureFault.NOT_GEOJSON,
					"The input's type is " + ((this.type != null) ? "\"" + this.type + "\"" : Tokens.describe(token))
							+ ", not \"FeatureCollection\"");
		}
	}

	/**
	 * Checks the document once its closing brace has been read.
	 * @param count how many features the collection held
	 */
	void finish(int count) {
		checkNothingFollows();
		if (!this.featuresSeen) {
			throw problem(FeatureFault.NOT_GEOJSON, "The input has no features member, so it is no FeatureCollection");
		}
		if (!this.typeSeen) {
			throw problem(FeatureFault.NOT_GEOJSON, "The input has no type member; it must say \"FeatureCollection\"");
		}
		if (count == 0) {
			throw problem(FeatureFault.EMPTY_COLLECTION, "The FeatureCollection holds no features");
		}
	}

	/** RFC 8259 allows one value per document; anything after it is not GeoJSON. */
	private void checkNothingFollows() {
		boolean more;
		try {
			more = this.parser.nextToken() != null;
		}
		catch (StreamReadException ex) {
			more = true;
		}
		if (more) {
			TokenStreamLocation at = this.parser.currentLocation();
			throw problem(FeatureFault.NOT_GEOJSON, "Something follows the FeatureCollection, at line " + at.getLineNr()
					+ ", column " + at.getColumnNr() + "; the input must end after it");
		}
	}

	static FeatureProblem problem(FeatureFault fault, String detail) {
		return new FeatureProblem(-1, null, fault, detail);
	}

}
