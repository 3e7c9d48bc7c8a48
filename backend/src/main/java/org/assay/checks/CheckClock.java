package org.assay.checks;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.Map;
import java.util.concurrent.atomic.LongAdder;

/**
 * Attributes the checks' CPU time to each check, on a sample of the drafts: one in
 * {@value #SAMPLE}, by draft number, so that the clock's own cost (a system call per
 * reading) stays out of the way. CPU time of the checking thread, not wall-clock time: on
 * a machine shared with other work a thread waits for a core, and that wait would be
 * counted against whichever check was running. The sums are scaled up by the sample rate,
 * so they estimate the CPU time over all drafts.
 */
final class CheckClock {

	static final int SAMPLE = 16;

	private static final ThreadMXBean THREADS = ManagementFactory.getThreadMXBean();

	private static final boolean SUPPORTED = THREADS.isCurrentThreadCpuTimeSupported();

	private static final CheckClock OFF = new CheckClock(false);

	/** What one reading of the clock costs, taken off each lap. */
	private static final long READING = SUPPORTED ? calibrate() : 0;

	private final boolean on;

	private long last;

	private CheckClock(boolean on) {
		this.on = on;
		this.last = on ? THREADS.getCurrentThreadCpuTime() : 0;
	}

	/** The median cost of a reading, over a thousand back to back. */
	private static long calibrate() {
		long[] costs = new long[1001];
		long last = THREADS.getCurrentThreadCpuTime();
		for (int i = 0; i < costs.length; i++) {
			long now = THREADS.getCurrentThreadCpuTime();
			costs[i] = now - last;
			last = now;
		}
		java.util.Arrays.sort(costs);
		return costs[costs.length / 2];
	}

	/** A clock that runs for one draft in {@value #SAMPLE}. */
	static CheckClock forDraft(int number) {
		return (SUPPORTED && number % SAMPLE == 0) ? new CheckClock(true) : OFF;
	}

	/** Adds the CPU time since the last lap to a named sum, scaled by the sample rate. */
	void lap(Map<String, LongAdder> sums, String name) {
		if (this.on) {
			long now = THREADS.getCurrentThreadCpuTime();
			sums.get(name).add(Math.max(0, now - this.last - READING) * SAMPLE);
			this.last = now;
		}
	}

}
