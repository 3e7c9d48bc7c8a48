package org.assay.geo;

/**
 * A fault found in a GeoJSON input, naming the feature (index and id) and the fault.
 * Document-level faults have index {@code -1}.
 */
public class FeatureProblem extends RuntimeException {

	private final int index;

	private final String featureId;

	private final FeatureFault fault;

	private final String detail;

	/**
	 * Creates a problem.
	 * @param index zero-based feature index, or -1 for the document
	 * @param featureId the feature's id, or {@code null}
	 * @param fault the fault
	 * @param detail a sentence saying what is wrong, for people
	 */
	public FeatureProblem(int index, String featureId, FeatureFault fault, String detail) {
		super(describe(index, featureId, detail));
		this.index = index;
		this.featureId = featureId;
		this.fault = fault;
		this.detail = detail;
	}

	private static String describe(int index, String featureId, String detail) {
		if (index < 0) {
			return detail;
		}
		return "Feature " + index + ((featureId != null) ? " (id " + featureId + ")" : "") + ": " + detail;
	}

	/**
	 * The zero-based index of the feature in the collection.
	 * @return the index, or -1 for a fault of the whole document
	 */
	public int index() {
		return this.index;
	}

	/**
	 * The id of the feature, when it has one and it was read before the fault.
	 * @return the id as text, or {@code null}
	 */
	public String featureId() {
		return this.featureId;
	}

	/**
	 * What is wrong.
	 * @return the fault
	 */
	public FeatureFault fault() {
		return this.fault;
	}

	/**
	 * The detail without the feature prefix.
	 * @return the message
	 */
	public String detail() {
		return this.detail;
	}

}
