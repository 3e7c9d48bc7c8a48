package org.assay.geo;

import java.util.Locale;

/**
 * What a drafted or reference feature is. Each kind allows certain geometry types.
 */
public enum FeatureKind {

	/** A road: LineString or MultiLineString. */
	ROAD,

	/** A building outline: Polygon or MultiPolygon. */
	BUILDING;

	/**
	 * The name used in GeoJSON properties and in the API.
	 * @return the lower-case name
	 */
	public String jsonName() {
		return name().toLowerCase(Locale.ROOT);
	}

	/**
	 * Parses a kind from its JSON name.
	 * @param value the JSON value, for example {@code "road"}
	 * @return the kind, or {@code null} when the value names no kind
	 */
	public static FeatureKind fromJson(String value) {
		if (value == null) {
			return null;
		}
		for (FeatureKind kind : values()) {
			if (kind.jsonName().equals(value)) {
				return kind;
			}
		}
		return null;
	}

}
