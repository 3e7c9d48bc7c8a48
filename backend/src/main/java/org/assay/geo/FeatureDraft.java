package org.assay.geo;

import tools.jackson.core.JsonToken;

/**
 * The pieces of one Feature as they stream past, in whatever order its members come. It
 * holds one feature only and is reused for the next, so that the reader's memory does not
 * grow with the document.
 */
final class FeatureDraft {

	int index;

	String id;

	boolean typeSeen;

	boolean geometrySeen;

	boolean geometryNull;

	String geometryType;

	final CoordinateBuffer coordinates = new CoordinateBuffer();

	String propertiesJson;

	/** The token of the {@code kind} property, {@code null} when absent. */
	JsonToken kindToken;

	String kindText;

	/** The token of the {@code confidence} property, {@code null} when absent. */
	JsonToken confidenceToken;

	String confidenceText;

	double confidence;

	String featureClass;

	private FeatureFault fault;

	private String faultDetail;

	void reset(int index) {
		this.index = index;
		this.id = null;
		this.typeSeen = false;
		this.geometrySeen = false;
		this.geometryNull = false;
		this.geometryType = null;
		this.coordinates.clear();
		this.propertiesJson = "{}";
		this.kindToken = null;
		this.kindText = null;
		this.confidenceToken = null;
		this.confidenceText = null;
		this.confidence = Double.NaN;
		this.featureClass = null;
		this.fault = null;
		this.faultDetail = null;
	}

	/**
	 * Records a fault met while streaming. Only the first counts: reading goes on to the
	 * end of the feature so that the report can name its id, which may come last.
	 */
	void fail(FeatureFault fault, String detail) {
		if (this.fault == null) {
			this.fault = fault;
			this.faultDetail = detail;
		}
	}

	FeatureFault fault() {
		return this.fault;
	}

	String faultDetail() {
		return this.faultDetail;
	}

}
