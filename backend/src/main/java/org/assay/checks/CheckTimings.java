package org.assay.checks;

import java.util.Map;

/**
 * Where a run of the checks spent its time.
 *
 * @param drafts the drafts checked
 * @param referenceFeatures the reference features indexed
 * @param phaseNanos wall-clock nanoseconds of each phase, in order: {@code reference}
 * (pack and index the reference layer), {@code drafts} (pack and index the drafts),
 * {@code connect} (the isolated-piece check's union-find), {@code checks} (the per-draft
 * checks on all cores) and {@code emit} (scores, handing out results)
 * @param checkNanos CPU nanoseconds spent in each per-draft check, summed over threads
 * and estimated from a sample of the drafts (see {@link CheckClock}), with {@code frame}
 * for drawing each draft in its frame and {@code neighbourhood} for gathering the
 * segments around it from the indexes, once for all checks
 */
public record CheckTimings(long drafts, long referenceFeatures, Map<String, Long> phaseNanos,
		Map<String, Long> checkNanos) {
}
