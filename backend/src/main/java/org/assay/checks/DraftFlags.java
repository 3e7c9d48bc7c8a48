package org.assay.checks;

import java.util.List;

/**
 * The outcome of the checks for one draft.
 *
 * @param id the draft's id
 * @param confidence the model's confidence
 * @param flags what the checks found, in a fixed order of checks; empty when nothing
 * @param risk the draft's {@link RiskScore}, 0 to 1
 */
public record DraftFlags(String id, double confidence, List<Flag> flags, double risk) {

	/**
	 * Whether a flag of a kind was raised.
	 * @param kind the kind
	 * @return whether any flag is of that kind
	 */
	public boolean has(FlagKind kind) {
		return this.flags.stream().anyMatch((f) -> f.kind() == kind);
	}

}
