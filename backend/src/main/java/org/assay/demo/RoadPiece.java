package org.assay.demo;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * A stretch of a true road that the model drafts as one feature, by distance along the
 * road.
 *
 * @param from metres from the road's start
 * @param to metres from the road's start
 * @param mapped whether the reference layer already holds this stretch
 * @param afterHiddenGap whether a stretch under tree cover lies just before it
 */
record RoadPiece(double from, double to, boolean mapped, boolean afterHiddenGap) {

	private static final double SHORTEST = 15;

	double length() {
		return this.to - this.from;
	}

	/**
	 * Cuts a road into pieces of 60 to 160 m around blocked stretches, so that no piece
	 * is partly mapped.
	 * @param length the road's length
	 * @param mapped how far from its start the road is mapped
	 * @param blocked stretches not to cut pieces from: {@code {from, to, hidden ? 1 : 0}}
	 * @param random the randomness
	 * @return the pieces in order along the road
	 */
	static List<RoadPiece> cut(double length, double mapped, List<double[]> blocked, DemoRandom random) {
		List<double[]> sorted = new ArrayList<>(blocked);
		sorted.sort(Comparator.comparingDouble((double[] b) -> b[0]));
		List<RoadPiece> pieces = new ArrayList<>();
		double cursor = 0;
		boolean afterHidden = false;
		for (double[] block : sorted) {
			if (block[0] > cursor) {
				visible(cursor, block[0], mapped, afterHidden, random, pieces);
			}
			if (block[1] > cursor) {
				cursor = block[1];
				afterHidden = block[2] > 0;
			}
		}
		visible(cursor, length, mapped, afterHidden, random, pieces);
		return pieces;
	}

	private static void visible(double from, double to, double mapped, boolean afterHidden, DemoRandom random,
			List<RoadPiece> pieces) {
		if (from < mapped && mapped < to) {
			pieces(from, mapped, true, afterHidden, random, pieces);
			pieces(mapped, to, false, false, random, pieces);
		}
		else {
			pieces(from, to, to <= mapped, afterHidden, random, pieces);
		}
	}

	private static void pieces(double from, double to, boolean mapped, boolean afterHidden, DemoRandom random,
			List<RoadPiece> pieces) {
		double at = from;
		boolean first = true;
		while (to - at >= SHORTEST) {
			double length = random.uniform(60, 160);
			double end = (to - (at + length) < 30) ? to : at + length;
			pieces.add(new RoadPiece(at, end, mapped, first && afterHidden));
			first = false;
			at = end;
		}
	}

}
