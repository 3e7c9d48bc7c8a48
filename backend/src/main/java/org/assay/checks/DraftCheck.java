package org.assay.checks;

import java.util.List;

/**
 * One check, run on one draft at a time from many threads: it must keep no state that
 * changes while checking.
 */
interface DraftCheck {

	/** A short name for timings. */
	String name();

	/** Adds the flags this check finds on a draft. */
	void check(LocalDraft draft, List<Flag> flags);

}
