package org.assay.geo;

import org.locationtech.jts.operation.valid.TopologyValidationError;

/**
 * Plain words for the polygon faults JTS {@code IsValidOp} finds, with the JTS name kept
 * in brackets so that a reader can look the rule up.
 */
final class ValidityWords {

	private ValidityWords() {
	}

	static String of(TopologyValidationError error) {
		String words = switch (error.getErrorType()) {
			case TopologyValidationError.RING_SELF_INTERSECTION -> "a ring crosses or touches itself";
			case TopologyValidationError.SELF_INTERSECTION -> "its rings cross each other";
			case TopologyValidationError.HOLE_OUTSIDE_SHELL -> "a hole lies outside its outer ring";
			case TopologyValidationError.NESTED_HOLES -> "a hole lies inside another hole";
			case TopologyValidationError.DISCONNECTED_INTERIOR -> "its holes cut the interior in pieces";
			case TopologyValidationError.NESTED_SHELLS -> "one of its polygons lies inside another";
			case TopologyValidationError.DUPLICATE_RINGS -> "two of its rings are the same";
			case TopologyValidationError.TOO_FEW_POINTS -> "a ring has fewer than 3 distinct positions";
			default -> "it breaks the simple-features rules";
		};
		return words + " (" + error.getMessage() + ")";
	}

}
