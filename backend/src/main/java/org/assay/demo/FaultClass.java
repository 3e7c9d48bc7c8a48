package org.assay.demo;

/**
 * What a draft of the demo batch really is: the truth a validator's verdict is measured
 * against.
 */
public enum FaultClass {

	/**
	 * A real feature not yet in the reference layer, drafted within about a metre or two.
	 */
	GOOD,

	/** A real feature that the reference layer already holds: a duplicate. */
	ALREADY_MAPPED,

	/**
	 * A real feature, drafted 6 to 15 m off its true place, or bowed, turned or swollen.
	 */
	SHIFTED,

	/**
	 * Nothing real: a field edge, a dry stream bed or a shadow drafted as a road, a
	 * bright patch in the woods or a field drafted as a building.
	 */
	FALSE_DETECTION,

	/** A short detached piece, under 80 m, of a real road. */
	FRAGMENT,

	/**
	 * A real road that continues a mapped one, overlapping its mapped end for a few tens
	 * of metres.
	 */
	PARTIAL

}
