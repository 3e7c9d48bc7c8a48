package org.assay.demo;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.assay.demo.DemoWorld.HiddenStretch;
import org.assay.demo.DemoWorld.Road;
import org.assay.geo.FeatureKind;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.LineString;

/**
 * Drafts of the true roads, the way a segmentation model drafts them: each road is cut
 * into pieces of 60 to 160 m along its visible stretches (nothing is drafted under tree
 * cover). A mapped piece is drafted again now and then (ALREADY_MAPPED); an unmapped one
 * is drafted well (GOOD, sometimes across a short gap under trees as a MultiLineString),
 * off its place (SHIFTED), as a short detached piece (FRAGMENT), or missed. Where a road
 * is mapped only part of the way, one draft continues it from its mapped end (PARTIAL).
 */
final class RoadDraftPlanter {

	private static final double JITTER = 0.6;

	private final ReferenceLayer reference;

	private final DemoRandom random;

	private final List<DraftPlan> plans = new ArrayList<>();

	private RoadDraftPlanter(ReferenceLayer reference, DemoRandom random) {
		this.reference = reference;
		this.random = random;
	}

	static List<DraftPlan> plant(DemoWorld world, ReferenceLayer reference, DemoRandom random) {
		RoadDraftPlanter planter = new RoadDraftPlanter(reference, random);
		for (Road road : world.roads()) {
			List<HiddenStretch> hidden = world.hiddenStretches()
				.stream()
				.filter((h) -> h.roadId().equals(road.id()))
				.toList();
			planter.road(road, hidden);
		}
		return planter.plans;
	}

	private void road(Road road, List<HiddenStretch> hidden) {
		double length = road.geometry().getLength();
		double mapped = this.reference.mappedLength(road.id());
		List<double[]> blocked = new ArrayList<>();
		hidden.forEach((h) -> blocked.add(new double[] { h.fromMetre(), h.toMetre(), 1 }));
		if (mapped > 0 && mapped < length) {
			double end = partial(road, mapped, hidden);
			blocked.add(new double[] { mapped, end, 0 });
		}
		List<RoadPiece> pieces = RoadPiece.cut(length, mapped, blocked, this.random);
		for (int i = 0; i < pieces.size(); i++) {
			RoadPiece piece = pieces.get(i);
			RoadPiece next = (i + 1 < pieces.size()) ? pieces.get(i + 1) : null;
			if (piece.mapped()) {
				if (this.random.chance(0.55)) {
					add(road, piece, FaultClass.ALREADY_MAPPED, draft(road, piece, 15, 40),
							"duplicate of a mapped road");
				}
			}
			else if (unmapped(road, piece, next)) {
				i++;
			}
		}
	}

	/**
	 * Plans the draft of an unmapped piece, if any.
	 * @return whether the next piece went into the same draft
	 */
	private boolean unmapped(Road road, RoadPiece piece, RoadPiece next) {
		double fate = this.random.uniform(0, 1);
		if (fate < 0.6) {
			if (next != null && next.afterHiddenGap() && !next.mapped() && next.from() - piece.to() < 300
					&& this.random.chance(0.5)) {
				goodAcrossGap(road, piece, next);
				return true;
			}
			if (piece.length() >= 50 && this.random.chance(0.04)) {
				goodAcrossSeam(road, piece);
			}
			else {
				add(road, piece, FaultClass.GOOD, draft(road, piece, 15, 40), "drafted as seen");
			}
		}
		else if (fate < 0.74) {
			shifted(road, piece);
		}
		else if (fate < 0.84 && piece.length() >= 30) {
			fragment(road, piece);
		}
		return false;
	}

	/** Plans the PARTIAL draft and answers where it ends. */
	private double partial(Road road, double mapped, List<HiddenStretch> hidden) {
		double length = road.geometry().getLength();
		double end = Math.min(length, mapped + this.random.uniform(80, 300));
		for (HiddenStretch stretch : hidden) {
			if (stretch.toMetre() > mapped && stretch.fromMetre() < end) {
				end = Math.max(mapped, stretch.fromMetre());
			}
		}
		if (end - mapped < 40) {
			return mapped;
		}
		double overlap = Math.min(mapped / 2, this.random.uniform(20, 60));
		RoadPiece piece = new RoadPiece(mapped - overlap, end, false, false);
		String detail = String.format(Locale.ROOT, "overlaps the mapped end by %.0f m and continues it for %.0f m",
				overlap, end - mapped);
		this.plans.add(new DraftPlan(FeatureKind.ROAD, draft(road, piece, 15, 40), FaultClass.PARTIAL,
				road.roadClass().jsonClass(), road.id(), this.reference.referenceIdOf(road.id()), truth(road, piece),
				detail));
		return end;
	}

	private void goodAcrossGap(Road road, RoadPiece piece, RoadPiece next) {
		Geometry drafted = LocalFrame.METRES
			.createMultiLineString(new LineString[] { draft(road, piece, 15, 40), draft(road, next, 15, 40) });
		Geometry truth = LocalFrame.METRES
			.createMultiLineString(new LineString[] { truth(road, piece), truth(road, next) });
		this.plans.add(new DraftPlan(FeatureKind.ROAD, drafted, FaultClass.GOOD, road.roadClass().jsonClass(),
				road.id(), null, truth, "drafted on both sides of a gap under tree cover"));
	}

	/** A good draft in two parts, a few metres apart where the model's tiles meet. */
	private void goodAcrossSeam(Road road, RoadPiece piece) {
		double cut = piece.from() + this.random.uniform(0.3, 0.7) * piece.length();
		double gap = this.random.uniform(3, 8);
		RoadPiece before = new RoadPiece(piece.from(), cut, false, false);
		RoadPiece after = new RoadPiece(cut + gap, piece.to(), false, false);
		Geometry drafted = LocalFrame.METRES
			.createMultiLineString(new LineString[] { draft(road, before, 15, 40), draft(road, after, 15, 40) });
		add(road, piece, FaultClass.GOOD, drafted, "drafted in two parts across a tile seam");
	}

	private void shifted(Road road, RoadPiece piece) {
		double distance = this.random.uniform(6, 15);
		if (this.random.chance(0.5)) {
			LineString drafted = draft(road, piece, 15, 40);
			LineString truth = truth(road, piece);
			double direction = StrictMath.atan2(truth.getEndPoint().getY() - truth.getStartPoint().getY(),
					truth.getEndPoint().getX() - truth.getStartPoint().getX());
			double side = this.random.sign() * distance;
			Geometry moved = Shapes.similarity(drafted, -side * StrictMath.sin(direction),
					side * StrictMath.cos(direction), 0, 1);
			add(road, piece, FaultClass.SHIFTED, moved,
					String.format(Locale.ROOT, "offset sideways by %.1f m", distance));
		}
		else {
			LineString bowed = MetricLines.bow(draft(road, piece, 8, 15), this.random.sign() * distance);
			add(road, piece, FaultClass.SHIFTED, bowed,
					String.format(Locale.ROOT, "bowed sideways by up to %.1f m", distance));
		}
	}

	private void fragment(Road road, RoadPiece piece) {
		double length = this.random.uniform(20, Math.min(75, piece.length()));
		double from = piece.from() + this.random.uniform(0, piece.length() - length);
		RoadPiece part = new RoadPiece(from, from + length, false, false);
		add(road, part, FaultClass.FRAGMENT, draft(road, part, 10, 25),
				String.format(Locale.ROOT, "detached %.0f m piece", length));
	}

	private void add(Road road, RoadPiece piece, FaultClass fault, Geometry drafted, String detail) {
		String referenceId = (fault == FaultClass.ALREADY_MAPPED) ? this.reference.referenceIdOf(road.id()) : null;
		this.plans.add(new DraftPlan(FeatureKind.ROAD, drafted, fault, road.roadClass().jsonClass(), road.id(),
				referenceId, truth(road, piece), detail));
	}

	private LineString draft(Road road, RoadPiece piece, double minStep, double maxStep) {
		return MetricLines.resample(truth(road, piece), minStep, maxStep, JITTER, this.random);
	}

	private static LineString truth(Road road, RoadPiece piece) {
		return MetricLines.extract(road.geometry(), piece.from(), piece.to());
	}

}
