package org.assay.checks;

/**
 * What a flag says, with its code name (as shown in the API and the export) and its
 * weight in the {@link RiskScore}: roughly the chance that a draft carrying the flag
 * needs a change or a rejection, set by judgement, not fitted. Certain faults weigh most
 * (a duplicate is rejected); faults a validator usually mends in passing weigh least.
 */
public enum FlagKind {

	/** The draft runs along a mapped feature for all its length: a duplicate. */
	MAPPED_ALREADY("mapped-already", "Already on the map", 0.9),

	/** The draft runs along a mapped feature for part of its length and goes on. */
	EXTENDS_MAPPED("extends-mapped", "Extends a mapped feature", 0.5),

	/**
	 * A road's end stops short of another road, or overshoots past it, by a few metres.
	 */
	NEAR_MISS("near-miss", "Nearly meets a road", 0.3),

	/** Two roads cross where neither has a vertex: a missing junction, or a bridge. */
	CROSSING_UNJOINED("crossing-unjoined", "Crosses a road without a junction", 0.3),

	/** A small set of joined road drafts that touches no mapped road. */
	ISOLATED_PIECE("isolated-piece", "Isolated piece", 0.4),

	/** A road crosses itself. */
	SELF_CROSSING("self-crossing", "Crosses itself", 0.6),

	/** Consecutive vertices at the same place. */
	REPEATED_POINT("repeated-point", "Repeated point", 0.1),

	/** A vertex where the line turns back on itself. */
	SPIKE("spike", "Spike", 0.5),

	/** A segment shorter than the limit. */
	SHORT_SEGMENT("short-segment", "Very short segment", 0.1),

	/** A road shorter than the limit in total. */
	SHORT_ROAD("short-road", "Very short road", 0.5),

	/** A building with less area than the limit. */
	SMALL_BUILDING("small-building", "Very small building", 0.5),

	/** Two building drafts overlap. */
	BUILDING_OVERLAP("building-overlap", "Overlaps another building", 0.6),

	/** A road draft runs through a building draft. */
	ROAD_THROUGH_BUILDING("road-through-building", "Road through a building", 0.5);

	private final String code;

	private final String label;

	private final double weight;

	FlagKind(String code, String label, double weight) {
		this.code = code;
		this.label = label;
		this.weight = weight;
	}

	/**
	 * A short label for people, for example {@code Stops short of a road}.
	 * @return the label
	 */
	public String label() {
		return this.label;
	}

	/**
	 * The kind with a code name.
	 * @param code for example {@code near-miss}
	 * @return the kind, or {@code null} when no kind has that code
	 */
	public static FlagKind ofCode(String code) {
		for (FlagKind kind : values()) {
			if (kind.code.equals(code)) {
				return kind;
			}
		}
		return null;
	}

	/**
	 * The code name, for example {@code near-miss}.
	 * @return the code
	 */
	public String code() {
		return this.code;
	}

	/**
	 * The weight in the risk score, in (0, 1).
	 * @return the weight
	 */
	public double weight() {
		return this.weight;
	}

}
