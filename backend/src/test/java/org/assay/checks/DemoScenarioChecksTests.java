package org.assay.checks;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.assay.demo.DemoDraft;
import org.assay.demo.DemoScenario;
import org.assay.demo.FaultClass;
import org.assay.demo.PlantedFault;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The checks on the demo scenario, compared with the truth the generator recorded for
 * each draft (never with the checks' own output): every planted duplicate, extension and
 * fragment is flagged as such. Prints, for each flag, how many drafts of each true class
 * carry it, and the false flags of the three flags the truth can judge.
 */
class DemoScenarioChecksTests {

	private static DemoScenario scenario;

	private static Map<String, DraftFlags> flags;

	@BeforeAll
	static void checkTheDemo() {
		scenario = DemoScenario.generate();
		List<CheckedDraft> drafts = new ArrayList<>();
		for (DemoDraft d : scenario.drafts()) {
			drafts.add(new CheckedDraft(d.id(), d.kind(), d.geometry(), d.confidence()));
		}
		List<MappedFeature> reference = scenario.reference()
			.stream()
			.map((f) -> new MappedFeature(f.id(), f.kind(), f.geometry()))
			.toList();
		flags = new LinkedHashMap<>();
		DraftChecker.check(drafts, reference).forEach((f) -> flags.put(f.id(), f));
		printTable();
		printIsolationByTouch(drafts, reference);
	}

	@Test
	void flagsEveryPlantedDuplicateAsMappedAlready() {
		checkEvery(FaultClass.ALREADY_MAPPED, FlagKind.MAPPED_ALREADY);
	}

	@Test
	void flagsEveryPlantedContinuationAsExtendingAMappedRoad() {
		checkEvery(FaultClass.PARTIAL, FlagKind.EXTENDS_MAPPED);
	}

	@Test
	void flagsEveryPlantedFragmentThatIsDetachedBeyondTheJittersReachAsAnIsolatedPiece() {
		// The demo moves every drafted vertex by a normal draw of 0.6 m per axis, clamped
		// at 1.5 m: at most 1.5·√2 = 2.12 m. Two drafted ends can so close a true gap of
		// up
		// to 4.24 m, and then come within the 1 m of touching: a fragment whose true
		// stretch lies more than 5.25 m from every other drafted or mapped road cannot
		// touch one. Those must all be flagged; the others are printed with their gaps.
		List<String> detached = new ArrayList<>();
		StringBuilder attached = new StringBuilder();
		for (String id : drafts(FaultClass.FRAGMENT)) {
			double gap = TrueGaps.gap(scenario, id);
			if (gap > 1 + 2 * 1.5 * Math.sqrt(2)) {
				detached.add(id);
			}
			else {
				attached.append(String.format(" %s (true gap %.2f m, %s)", id, gap,
						flags.get(id).has(FlagKind.ISOLATED_PIECE) ? "flagged" : "not flagged"));
			}
		}
		System.out.println("Fragments within the jitter's reach of another road:" + attached);
		assertThat(detached).hasSizeGreaterThan(drafts(FaultClass.FRAGMENT).size() / 2)
			.allMatch((id) -> flags.get(id).has(FlagKind.ISOLATED_PIECE));
	}

	@Test
	void flagsNoGoodDraftAsADuplicate() {
		assertThat(drafts(FaultClass.GOOD)).noneMatch((id) -> flags.get(id).has(FlagKind.MAPPED_ALREADY));
	}

	private static void checkEvery(FaultClass planted, FlagKind expected) {
		List<String> ids = drafts(planted);
		assertThat(ids).as("planted %s", planted).isNotEmpty();
		assertThat(ids).as("%s drafts without %s", planted, expected.code())
			.allMatch((id) -> flags.get(id).has(expected));
	}

	private static List<String> drafts(FaultClass planted) {
		return scenario.truth()
			.values()
			.stream()
			.filter((t) -> t.faultClass() == planted)
			.map(PlantedFault::draftId)
			.toList();
	}

	private static void printTable() {
		Map<FaultClass, Integer> totals = new EnumMap<>(FaultClass.class);
		Map<FlagKind, Map<FaultClass, Integer>> table = new EnumMap<>(FlagKind.class);
		for (PlantedFault truth : scenario.truth().values()) {
			totals.merge(truth.faultClass(), 1, Integer::sum);
			flags.get(truth.draftId())
				.flags()
				.stream()
				.map(Flag::kind)
				.distinct()
				.forEach((kind) -> table.computeIfAbsent(kind, (k) -> new EnumMap<>(FaultClass.class))
					.merge(truth.faultClass(), 1, Integer::sum));
		}
		StringBuilder out = new StringBuilder("\nDemo scenario: drafts carrying each flag, by true class\n");
		out.append(String.format("%-22s", "flag \\ truth"));
		for (FaultClass c : FaultClass.values()) {
			out.append(String.format("%16s", c + " " + totals.getOrDefault(c, 0)));
		}
		out.append('\n');
		table.forEach((kind, row) -> {
			out.append(String.format("%-22s", kind.code()));
			for (FaultClass c : FaultClass.values()) {
				out.append(String.format("%16d", row.getOrDefault(c, 0)));
			}
			out.append('\n');
		});
		out.append(String.format(
				"false flags: mapped-already %d (truth not ALREADY_MAPPED), extends-mapped %d "
						+ "(not PARTIAL), isolated-piece %d (not FRAGMENT or FALSE_DETECTION)%n",
				falseFlags(table, FlagKind.MAPPED_ALREADY, FaultClass.ALREADY_MAPPED),
				falseFlags(table, FlagKind.EXTENDS_MAPPED, FaultClass.PARTIAL),
				falseFlags(table, FlagKind.ISOLATED_PIECE, FaultClass.FRAGMENT, FaultClass.FALSE_DETECTION)));
		System.out.print(out);
	}

	/** How the isolated-piece flags fall with the touching distance. */
	private static void printIsolationByTouch(List<CheckedDraft> drafts, List<MappedFeature> reference) {
		for (double touch : new double[] { 1, 5, 10 }) {
			CheckSettings only = CheckSettings.NONE.with(new IsolationSettings(true, 200, touch));
			Map<FaultClass, Integer> row = new EnumMap<>(FaultClass.class);
			new DraftChecker(only).run(drafts.iterator(), reference.iterator(), (f) -> {
				if (f.has(FlagKind.ISOLATED_PIECE)) {
					row.merge(scenario.truth().get(f.id()).faultClass(), 1, Integer::sum);
				}
			});
			System.out.printf("isolated-piece with touchMetres %4.1f: %s%n", touch, row);
		}
	}

	private static int falseFlags(Map<FlagKind, Map<FaultClass, Integer>> table, FlagKind kind, FaultClass... right) {
		Map<FaultClass, Integer> row = new EnumMap<>(FaultClass.class);
		row.putAll(table.getOrDefault(kind, Map.of()));
		for (FaultClass c : right) {
			row.remove(c);
		}
		return row.values().stream().mapToInt(Integer::intValue).sum();
	}

}
