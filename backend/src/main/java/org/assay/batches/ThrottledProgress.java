package org.assay.batches;

import java.time.Duration;
import java.util.function.IntConsumer;
import java.util.function.LongSupplier;

/**
 * Passes counts on to a progress report at most once per interval and drops the rest.
 * Each report of an upload job is a transaction of its own (a commit, so a disk flush on
 * PostgreSQL), which a job that reports every thousand rows would pay a thousand times
 * per million; readers poll the job about once a second and need no more.
 */
final class ThrottledProgress implements IntConsumer {

	/** The interval upload jobs use. */
	static final Duration INTERVAL = Duration.ofMillis(500);

	private final IntConsumer target;

	private final long intervalNanos;

	private final LongSupplier nanoClock;

	private long last;

	ThrottledProgress(IntConsumer target, Duration interval, LongSupplier nanoClock) {
		this.target = target;
		this.intervalNanos = interval.toNanos();
		this.nanoClock = nanoClock;
		this.last = nanoClock.getAsLong();
	}

	/**
	 * Throttles a report to {@link #INTERVAL}, counted from now.
	 * @param target the report
	 * @return the throttled report
	 */
	static ThrottledProgress of(IntConsumer target) {
		return new ThrottledProgress(target, INTERVAL, System::nanoTime);
	}

	@Override
	public void accept(int count) {
		long now = this.nanoClock.getAsLong();
		if (now - this.last >= this.intervalNanos) {
			this.last = now;
			this.target.accept(count);
		}
	}

}
