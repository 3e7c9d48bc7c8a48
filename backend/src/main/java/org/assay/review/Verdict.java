package org.assay.review;

/**
 * What a validator decides about a draft.
 */
public enum Verdict {

	/** Correct as drafted. */
	ACCEPT,

	/** Real, with a corrected geometry. */
	AMEND,

	/** Not to be published. */
	REJECT,

	/** Cannot decide; a lead rules on it. */
	ESCALATE;

	/**
	 * Whether the drafted feature is kept (published) under this verdict.
	 * @return true for ACCEPT and AMEND
	 */
	public boolean keeps() {
		return this == ACCEPT || this == AMEND;
	}

}
