package org.assay.geo;

/**
 * A fault found in a GeoJSON input, naming the feature (index and id) and the fault.
 * Document-level faults have index {@code -1}.
 */
public class FeatureProblem extends RuntimeException {

	private final int index;

	private final String featureId;

	private final FeatureFault fault;

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
	}

	private static String describe(int index, String featureId, String detail) {
		if (index < 0) {
			return detail;
		}
		return "Feature " + index + ((featureId != null) ? " (id " + featureId + ")" : "") + ": " + detail;
	}

	public int index() {
		return this.index;
	}

	public String featureId() {
		return this.featureId;
	}

	public FeatureFault fault() {
		return this.fault;
	}

	/**
	 * The detail without the feature prefix.
	 * @return the message
	 */
	public String detail() {
		return getMessage();
	}

}
