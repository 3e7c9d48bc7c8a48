package org.assay.geo;

/**
 * A fault found while checking or building one geometry; the reader turns it into a
 * {@link FeatureProblem} that names the feature. No stack trace: it is an answer, not a
 * bug.
 */
final class GeometryFault extends RuntimeException {

	private final FeatureFault fault;

	GeometryFault(FeatureFault fault, String detail) {
		super(detail, null, false, false);
		this.fault = fault;
	}

	FeatureFault fault() {
		return this.fault;
	}

}
