package org.assay.demo;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.assay.demo.DemoWorld.Building;
import org.assay.geo.FeatureKind;
import org.locationtech.jts.geom.Geometry;

/**
 * Drafts of the true buildings: a mapped building is drafted again now and then
 * (ALREADY_MAPPED); an unmapped one is drafted well (GOOD: moved by about half a metre,
 * turned by a degree or two, scaled by a few per cent), off its place or out of shape
 * (SHIFTED), or missed. Similarities keep the outlines valid.
 */
final class BuildingDraftPlanter {

	private BuildingDraftPlanter() {
	}

	static List<DraftPlan> plant(DemoWorld world, ReferenceLayer reference, DemoRandom random) {
		List<DraftPlan> plans = new ArrayList<>();
		for (Building building : world.buildings()) {
			String referenceId = reference.referenceIdOf(building.id());
			double fate = random.uniform(0, 1);
			if (referenceId != null) {
				if (fate < 0.35) {
					plans.add(plan(building, FaultClass.ALREADY_MAPPED, referenceId, close(building, random),
							"duplicate of a mapped building"));
				}
			}
			else if (fate < 0.62) {
				plans.add(plan(building, FaultClass.GOOD, null, close(building, random), "drafted as seen"));
			}
			else if (fate < 0.78) {
				plans.add(shifted(building, random));
			}
		}
		return plans;
	}

	private static Geometry close(Building building, DemoRandom random) {
		return Shapes.similarity(building.geometry(), random.gaussian(0.5, 1.2), random.gaussian(0.5, 1.2),
				Math.toRadians(random.gaussian(1, 2.5)), 1 + random.gaussian(0.015, 0.04));
	}

	private static DraftPlan shifted(Building building, DemoRandom random) {
		if (random.chance(0.6)) {
			double distance = random.uniform(6, 15);
			double direction = random.angle();
			Geometry moved = Shapes.similarity(building.geometry(), distance * StrictMath.cos(direction),
					distance * StrictMath.sin(direction), Math.toRadians(random.gaussian(1, 2.5)), 1);
			return plan(building, FaultClass.SHIFTED, null, moved,
					String.format(Locale.ROOT, "offset by %.1f m", distance));
		}
		double turn = random.sign() * random.uniform(15, 30);
		double scale = random.uniform(1.2, 1.45);
		Geometry distorted = Shapes.similarity(building.geometry(), random.gaussian(1, 2.5), random.gaussian(1, 2.5),
				Math.toRadians(turn), scale);
		return plan(building, FaultClass.SHIFTED, null, distorted,
				String.format(Locale.ROOT, "turned by %.0f degrees and scaled by %.2f", turn, scale));
	}

	private static DraftPlan plan(Building building, FaultClass fault, String referenceId, Geometry drafted,
			String detail) {
		return new DraftPlan(FeatureKind.BUILDING, drafted, fault, building.buildingClass(), building.id(), referenceId,
				building.geometry(), detail);
	}

}
