package org.assay.checks;

import java.util.List;

/**
 * One check, run on one draft at a time from many threads: it must keep no state that
 * changes while checking.
 */
interface DraftCheck {

	/** A short name for timings. */
	String name();

	/**
	 * Adds the flags this check finds on a draft.
	 * @param draft the draft in its frame
	 * @param near the segments around it, within the largest reach of the checks
	 * @param flags where to add flags
	 */
	void check(LocalDraft draft, Neighbourhood near, List<Flag> flags);

}
