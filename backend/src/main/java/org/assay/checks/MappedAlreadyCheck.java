package org.assay.checks;

import java.util.List;

/**
 * Already on the map: does the draft run along a mapped feature of its kind (roads along
 * reference roads, building outlines along reference building outlines)?
 *
 * <p>
 * Two measures, both in the draft's {@link MetricFrame}: the share of the draft's length
 * within {@link MappedSettings#bufferMetres()} of the mapped features
 * ({@link AlongMeasure}, exact for straight segments), and the directed discrete
 * Hausdorff distance from the draft's vertices to them ({@link DirectedHausdorff}, with
 * early exit at {@link MappedSettings#maxHausdorffMetres()}).
 * <ul>
 * <li>{@link FlagKind#MAPPED_ALREADY}: share ≥ {@code fullShare} and Hausdorff ≤
 * {@code maxHausdorffMetres}. Values: {@code share}, {@code hausdorffMetres},
 * {@code lengthMetres}, {@code alongMetres}; the other id is the mapped feature nearest
 * to the draft's middle vertex.</li>
 * <li>{@link FlagKind#EXTENDS_MAPPED}: otherwise, when at least {@code minAlongMetres}
 * run along: a draft that continues a mapped road, or one that strays off it. Same
 * values; the point is where the longest run along the mapped feature ends inside the
 * draft.</li>
 * </ul>
 * Reported lengths and the Hausdorff distance are measured again with GeographicLib:
 * {@code lengthMetres} is the geodesic length, {@code alongMetres} is that times the
 * share, {@code hausdorffMetres} the geodesic distance between the witness vertex and its
 * nearest point. A draft with no mapped feature within reach costs nothing here: the
 * {@link Neighbourhood} is gathered once for all checks.
 */
final class MappedAlreadyCheck implements DraftCheck {

	private final MappedSettings settings;

	MappedAlreadyCheck(MappedSettings settings) {
		this.settings = settings;
	}

	/** How far from the draft mapped features matter. */
	double reach() {
		return Math.max(this.settings.bufferMetres(), this.settings.maxHausdorffMetres());
	}

	@Override
	public String name() {
		return "mapped-already";
	}

	@Override
	public void check(LocalDraft draft, Neighbourhood around, List<Flag> flags) {
		NearbySegments near = around.mapped();
		if (near.size == 0) {
			return;
		}
		DirectedHausdorff hausdorff = DirectedHausdorff.measure(draft, near, this.settings.maxHausdorffMetres());
		AlongMeasure along = AlongMeasure.measure(draft, near, this.settings.bufferMetres());
		boolean duplicate = hausdorff.withinLimit() && along.share() >= this.settings.fullShare();
		if (!duplicate && along.covered < this.settings.minAlongMetres()) {
			return;
		}
		if (!hausdorff.withinLimit()) {
			hausdorff = DirectedHausdorff.measure(draft, near, Double.POSITIVE_INFINITY);
		}
		int middle = draft.x.length / 2;
		Flag.Builder flag = Flag.of(duplicate ? FlagKind.MAPPED_ALREADY : FlagKind.EXTENDS_MAPPED)
			.value("share", along.share())
			.value("hausdorffMetres", hausdorff.geodesic(draft, near))
			.other(near.owner[near.nearest(draft.x[middle], draft.y[middle])].id);
		if (!duplicate) {
			flag.value("alongMetres", along.share() * Geodesics.length(draft.feature));
		}
		if (!duplicate && !Double.isNaN(along.leaveAt)) {
			double[] p = AlongMeasure.pointAt(draft, along.leaveAt);
			flag.at(draft.frame.lon(p[0]), draft.frame.lat(p[1]));
		}
		flags.add(flag.build());
	}

}
