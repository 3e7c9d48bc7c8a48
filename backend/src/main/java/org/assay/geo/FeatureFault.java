package org.assay.geo;

/**
 * The faults that make a GeoJSON input unacceptable. Each has a stable code that appears
 * in problem responses.
 */
public enum FeatureFault {

	/**
	 * The input is not JSON, or not a GeoJSON FeatureCollection, or a member has the
	 * wrong type.
	 */
	NOT_GEOJSON("not-geojson"),
	/** A {@code crs} member: RFC 7946 coordinates are always WGS84. */
	CRS_MEMBER("crs-member"),
	/** The feature has no geometry or a null geometry. */
	MISSING_GEOMETRY("missing-geometry"),
	/** The geometry type is unknown or not allowed for the feature's kind. */
	WRONG_GEOMETRY_TYPE("wrong-geometry-type"),
	/** The {@code kind} property is missing or names no known kind. */
	UNKNOWN_KIND("unknown-kind"),
	/** A coordinate is not a finite number. */
	COORDINATE_NOT_FINITE("coordinate-not-finite"),
	/** A longitude outside -180..180 or a latitude outside -90..90. */
	COORDINATE_OUT_OF_RANGE("coordinate-out-of-range"),
	/** A position with fewer than two numbers, or malformed coordinates. */
	BAD_POSITION("bad-position"),
	/** A line with fewer than two distinct positions or a ring with fewer than four. */
	TOO_FEW_POINTS("too-few-points"),
	/** A polygon ring whose last position differs from its first. */
	UNCLOSED_RING("unclosed-ring"),
	/** A polygon whose rings cross themselves or each other. */
	SELF_INTERSECTING_RING("self-intersecting-ring"),
	/** The confidence property is missing, not a number, or outside 0..1. */
	BAD_CONFIDENCE("bad-confidence"),
	/** More coordinates in one feature than the configured limit. */
	TOO_MANY_COORDINATES("too-many-coordinates"),
	/** The properties object of one feature is larger than the configured limit. */
	PROPERTIES_TOO_LARGE("properties-too-large"),
	/** The whole file is larger than the configured limit. */
	FILE_TOO_LARGE("file-too-large"),
	/** Two features share the same id. */
	DUPLICATE_ID("duplicate-id"),
	/** The collection holds no feature at all. */
	EMPTY_COLLECTION("empty-collection");

	private final String code;

	FeatureFault(String code) {
		this.code = code;
	}

	/**
	 * The stable code of the fault, as used in problem responses.
	 * @return the code
	 */
	public String code() {
		return this.code;
	}

}
