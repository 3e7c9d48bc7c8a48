package org.assay.agreement;

import java.util.List;
import java.util.Optional;

/**
 * The two-way outcome of a verdict: the drafted feature is kept (verdict ACCEPT or AMEND)
 * or dropped (REJECT). ESCALATE has no outcome: the validator deferred the decision to a
 * lead, so it is neither a keep nor a drop, and counting it as either would invent a
 * decision nobody made. Pairs with an ESCALATE on either side are therefore left out of
 * the keep-or-drop table (they reach the ruling queue instead); the full verdict table
 * keeps ESCALATE as a category of its own. Verdicts are taken by name so that this module
 * depends on no other.
 */
public enum KeepOrDrop {

	/** The feature is published: ACCEPT or AMEND. */
	KEEP,

	/** The feature is not published: REJECT. */
	DROP;

	private static final List<KeepOrDrop> BOTH = List.of(KEEP, DROP);

	/**
	 * The outcome of a verdict.
	 * @param verdict a verdict name: ACCEPT, AMEND, REJECT or ESCALATE
	 * @return KEEP or DROP, empty for ESCALATE
	 * @throws IllegalArgumentException for any other name
	 */
	public static Optional<KeepOrDrop> ofVerdict(String verdict) {
		switch (verdict) {
			case "ACCEPT", "AMEND":
				return Optional.of(KEEP);
			case "REJECT":
				return Optional.of(DROP);
			case "ESCALATE":
				return Optional.empty();
			default:
				throw new IllegalArgumentException("'" + verdict + "' is not a verdict");
		}
	}

	/**
	 * The keep-or-drop table of two validators' verdicts on the same drafts.
	 * @param first the first validator's verdict names, null where missing
	 * @param second the second validator's verdict names on the same drafts
	 * @return the 2&times;2 table, KEEP first; missing and ESCALATE pairs excluded
	 */
	public static ContingencyTable<KeepOrDrop> table(List<String> first, List<String> second) {
		List<String> verdicts = List.of("ACCEPT", "AMEND", "REJECT", "ESCALATE");
		return collapse(ContingencyTable.of(verdicts, first, second));
	}

	/**
	 * Collapses a table over verdict names to keep or drop.
	 * @param verdicts a table whose categories are verdict names
	 * @return the 2&times;2 table, KEEP first; ESCALATE pairs excluded
	 */
	public static ContingencyTable<KeepOrDrop> collapse(ContingencyTable<String> verdicts) {
		return verdicts.collapse(BOTH, (verdict) -> ofVerdict(verdict).orElse(null));
	}

}
