package org.assay.batches;

/**
 * Where a batch is in its life.
 */
public enum BatchState {

	/** Open for review: validators may claim its cells. */
	OPEN,

	/** Stopped for a while by a lead: no new claims. */
	PAUSED,

	/** Done: no more claims or verdicts. */
	CLOSED

}
