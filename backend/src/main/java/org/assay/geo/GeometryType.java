package org.assay.geo;

/**
 * The GeoJSON geometry types (RFC 7946 section 3.1), with the names of the levels of
 * their coordinate arrays, used to say where in a geometry a fault lies.
 */
enum GeometryType {

	POINT("Point", null),

	MULTI_POINT("MultiPoint", null),

	LINE_STRING("LineString", FeatureKind.ROAD, "position"),

	MULTI_LINE_STRING("MultiLineString", FeatureKind.ROAD, "line", "position"),

	POLYGON("Polygon", FeatureKind.BUILDING, "ring", "position"),

	MULTI_POLYGON("MultiPolygon", FeatureKind.BUILDING, "polygon", "ring", "position"),

	GEOMETRY_COLLECTION("GeometryCollection", null);

	private final String jsonName;

	private final FeatureKind kind;

	private final String[] levels;

	GeometryType(String jsonName, FeatureKind kind, String... levels) {
		this.jsonName = jsonName;
		this.kind = kind;
		this.levels = levels;
	}

	String jsonName() {
		return this.jsonName;
	}

	/**
	 * Whether features of a kind may have this type. Points and collections are never
	 * allowed: a draft must be a road line or a building outline.
	 */
	boolean allowedFor(FeatureKind kind) {
		return this.kind == kind;
	}

	/**
	 * Names a place in the coordinates for people, for example {@code "ring 0, position
	 * 3"}. A path that does not fit the type's nesting is shown as array indexes.
	 * @param path the array indexes from the outermost level
	 * @param length how many entries of {@code path} to use
	 */
	String describe(int[] path, int length) {
		StringBuilder text = new StringBuilder();
		if (length > this.levels.length) {
			text.append("coordinates");
			for (int i = 0; i < length; i++) {
				text.append('[').append(path[i]).append(']');
			}
			return text.toString();
		}
		for (int i = 0; i < length; i++) {
			text.append((i > 0) ? ", " : "").append(this.levels[i]).append(' ').append(path[i]);
		}
		return text.toString();
	}

	static GeometryType fromJson(String name) {
		for (GeometryType type : values()) {
			if (type.jsonName.equals(name)) {
				return type;
			}
		}
		return null;
	}

}
