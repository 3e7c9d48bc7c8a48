package org.assay.checks;

import java.util.ArrayList;
import java.util.Collection;
import java.util.Collections;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ForkJoinPool;
import java.util.concurrent.atomic.LongAdder;
import java.util.function.Consumer;
import java.util.function.Function;
import java.util.stream.IntStream;

/**
 * Runs all checks that are switched on over the drafts of a batch and the reference
 * layer, on all cores, and hands out each draft's flags and risk.
 *
 * <p>
 * The reference layer is read once from an iterator and held packed and indexed
 * ({@link ReferenceIndex}). The drafts are read once from an iterator and kept packed (8
 * bytes a position plus about 300 bytes a draft with its index entry, no JTS geometry for
 * roads; {@link DraftIndex}), because the checks compare drafts with their neighbours.
 * The checks then run on blocks of {@value #BLOCK} drafts in a {@link ForkJoinPool} of
 * the given parallelism (default: all cores), and each block's results go to the
 * consumer, draft by draft in the order read, before the next block starts. So memory is
 * the packed drafts, their index, the packed reference and one block's flags, whatever
 * the input's encoding.
 *
 * <pre>
 * List&lt;DraftFlags&gt; flags = DraftChecker.check(drafts, reference);
 * </pre>
 */
public final class DraftChecker {

	/**
	 * Drafts checked before their results are handed out: bounds the flags held at once.
	 */
	private static final int BLOCK = 1 << 14;

	private final CheckSettings settings;

	private final int parallelism;

	/**
	 * A checker with settings, on all cores.
	 * @param settings the checks' settings
	 */
	public DraftChecker(CheckSettings settings) {
		this(settings, Runtime.getRuntime().availableProcessors());
	}

	/**
	 * A checker with settings and a number of threads.
	 * @param settings the checks' settings
	 * @param parallelism the threads to check on, at least 1
	 */
	public DraftChecker(CheckSettings settings, int parallelism) {
		if (parallelism < 1) {
			throw new IllegalArgumentException("parallelism must be at least 1");
		}
		this.settings = settings;
		this.parallelism = parallelism;
	}

	/**
	 * Checks drafts with the default settings.
	 * @param drafts the drafts of a batch
	 * @param reference the reference layer
	 * @return each draft's flags, in the order of the drafts
	 */
	public static List<DraftFlags> check(Collection<CheckedDraft> drafts, Collection<MappedFeature> reference) {
		List<DraftFlags> out = new ArrayList<>();
		new DraftChecker(CheckSettings.DEFAULTS).run(drafts.iterator(), reference.iterator(), out::add);
		return out;
	}

	/**
	 * Checks drafts.
	 * @param drafts the drafts of a batch, read once; ids should be unique
	 * @param reference the reference layer, read once
	 * @param sink receives each draft's flags, in the order of the drafts, on the calling
	 * thread
	 * @return where the time went
	 */
	public CheckTimings run(Iterator<CheckedDraft> drafts, Iterator<MappedFeature> reference,
			Consumer<DraftFlags> sink) {
		Map<String, Long> phases = new LinkedHashMap<>();
		long start = System.nanoTime();
		ReferenceIndex referenceIndex = new ReferenceIndex(reference);
		start = lap(phases, "reference", start);
		DraftIndex draftIndex = new DraftIndex();
		drafts.forEachRemaining(draftIndex::add);
		draftIndex.build();
		start = lap(phases, "drafts", start);
		ForkJoinPool pool = new ForkJoinPool(this.parallelism);
		try {
			List<DraftCheck> checks = checks(referenceIndex, draftIndex, pool);
			start = lap(phases, "connect", start);
			double reach = reach();
			Map<String, LongAdder> spent = new LinkedHashMap<>();
			spent.put("frame", new LongAdder());
			spent.put("neighbourhood", new LongAdder());
			checks.forEach((check) -> spent.put(check.name(), new LongAdder()));
			List<PackedFeature> all = draftIndex.drafts;
			long checking = 0;
			long emitting = 0;
			for (int from = 0; from < all.size(); from += BLOCK) {
				int to = Math.min(all.size(), from + BLOCK);
				List<Flag>[] found = checkBlock(all, from, to, checks, spent, pool,
						(d) -> Neighbourhood.gather(referenceIndex, draftIndex, d, reach));
				long emit = System.nanoTime();
				checking += emit - start;
				for (int i = from; i < to; i++) {
					List<Flag> flags = (found[i - from] != null) ? found[i - from] : List.of();
					PackedFeature draft = all.get(i);
					sink.accept(new DraftFlags(draft.id, draft.confidence, flags,
							RiskScore.draft(draft.confidence, flags)));
				}
				start = System.nanoTime();
				emitting += start - emit;
			}
			phases.put("checks", checking);
			phases.put("emit", emitting);
			Map<String, Long> checkNanos = new LinkedHashMap<>();
			spent.forEach((name, nanos) -> checkNanos.put(name, nanos.sum()));
			return new CheckTimings(all.size(), referenceIndex.size(), Collections.unmodifiableMap(phases),
					Collections.unmodifiableMap(checkNanos));
		}
		finally {
			pool.shutdown();
		}
	}

	private List<DraftCheck> checks(ReferenceIndex reference, DraftIndex drafts, ForkJoinPool pool) {
		List<DraftCheck> checks = new ArrayList<>();
		if (this.settings.mapped().enabled()) {
			checks.add(new MappedAlreadyCheck(this.settings.mapped()));
		}
		if (this.settings.nearMiss().enabled()) {
			checks.add(new NearMissCheck(this.settings.nearMiss()));
		}
		if (this.settings.crossing().enabled()) {
			checks.add(new CrossingCheck(this.settings.crossing()));
		}
		if (this.settings.isolation().enabled()) {
			IsolatedPieceCheck isolation = new IsolatedPieceCheck(this.settings.isolation(), reference, drafts);
			isolation.prepare(pool);
			checks.add(isolation);
		}
		if (this.settings.shape().enabled()) {
			checks.add(new LineShapeCheck(this.settings.shape()));
		}
		if (this.settings.building().enabled()) {
			checks.add(new BuildingCheck(this.settings.building(), drafts));
		}
		return checks;
	}

	/**
	 * The largest distance from a draft at which the checks that are on look for things.
	 */
	private double reach() {
		double reach = 0.01;
		if (this.settings.mapped().enabled()) {
			reach = Math.max(reach, new MappedAlreadyCheck(this.settings.mapped()).reach());
		}
		if (this.settings.nearMiss().enabled()) {
			reach = Math.max(reach, new NearMissCheck(this.settings.nearMiss()).reach());
		}
		return reach;
	}

	@SuppressWarnings("unchecked")
	private static List<Flag>[] checkBlock(List<PackedFeature> all, int from, int to, List<DraftCheck> checks,
			Map<String, LongAdder> spent, ForkJoinPool pool, Function<LocalDraft, Neighbourhood> gather) {
		List<Flag>[] found = new List[to - from];
		pool.submit(() -> IntStream.range(from, to)
			.parallel()
			.forEach((i) -> found[i - from] = checkOne(all.get(i), checks, spent, gather))).join();
		return found;
	}

	private static List<Flag> checkOne(PackedFeature draft, List<DraftCheck> checks, Map<String, LongAdder> spent,
			Function<LocalDraft, Neighbourhood> gather) {
		CheckClock clock = CheckClock.forDraft(draft.number);
		LocalDraft local = new LocalDraft(draft);
		clock.lap(spent, "frame");
		Neighbourhood near = gather.apply(local);
		clock.lap(spent, "neighbourhood");
		List<Flag> flags = new ArrayList<>(0);
		for (DraftCheck check : checks) {
			check.check(local, near, flags);
			clock.lap(spent, check.name());
		}
		return flags.isEmpty() ? null : List.copyOf(flags);
	}

	private static long lap(Map<String, Long> phases, String name, long start) {
		long now = System.nanoTime();
		phases.put(name, now - start);
		return now;
	}

}
