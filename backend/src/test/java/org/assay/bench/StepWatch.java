package org.assay.bench;

import java.lang.management.GarbageCollectorMXBean;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.util.List;

import com.sun.management.OperatingSystemMXBean;

/**
 * Watches the resources of one measured step: the CPU time of the whole process (all
 * threads: the job's, the collector's, the compiler's, H2's; not the PostgreSQL
 * server's), which a shared machine disturbs less than the wall clock, and the heap. Two
 * figures of the heap, because a collector with room to spare lets garbage pile up in the
 * young generation whatever the step holds:
 * <ul>
 * <li>peak: the sum of the heap pools' peaks (each pool's peak is reset at the start), an
 * upper bound of the heap in use at any moment, garbage included;</li>
 * <li>old gen: the peak of the old generation, an upper bound of what the step held
 * beyond the short term (what survived young collections and was not yet reclaimed).</li>
 * </ul>
 * It also counts the collections and their accumulated time.
 */
public final class StepWatch {

	private static final long MB = 1L << 20;

	private final List<MemoryPoolMXBean> pools = ManagementFactory.getMemoryPoolMXBeans()
		.stream()
		.filter((pool) -> pool.getType() == MemoryType.HEAP)
		.toList();

	private final List<GarbageCollectorMXBean> collectors = ManagementFactory.getGarbageCollectorMXBeans();

	private long collections;

	private long collectionMillis;

	private long cpuNanos;

	/**
	 * Collects garbage, then resets the peaks and starts counting.
	 */
	public void start() {
		System.gc();
		this.pools.forEach(MemoryPoolMXBean::resetPeakUsage);
		this.collections = this.collectors.stream().mapToLong(GarbageCollectorMXBean::getCollectionCount).sum();
		this.collectionMillis = this.collectors.stream().mapToLong(GarbageCollectorMXBean::getCollectionTime).sum();
		this.cpuNanos = cpuNanos();
	}

	/**
	 * Stops counting.
	 * @return the figures
	 */
	public Usage stop() {
		long peak = 0;
		long oldPeak = 0;
		for (MemoryPoolMXBean pool : this.pools) {
			peak += pool.getPeakUsage().getUsed();
			if (pool.getName().matches("(?i).*(old|tenured).*")) {
				oldPeak += pool.getPeakUsage().getUsed();
			}
		}
		long count = this.collectors.stream().mapToLong(GarbageCollectorMXBean::getCollectionCount).sum();
		long millis = this.collectors.stream().mapToLong(GarbageCollectorMXBean::getCollectionTime).sum();
		return new Usage(cpuNanos() - this.cpuNanos, peak / MB, oldPeak / MB, count - this.collections,
				millis - this.collectionMillis);
	}

	private static long cpuNanos() {
		return ((OperatingSystemMXBean) ManagementFactory.getOperatingSystemMXBean()).getProcessCpuTime();
	}

	/**
	 * What one step used; heap figures in MiB.
	 *
	 * @param cpuNanos CPU time of the process
	 * @param peakMb sum of the heap pools' peaks
	 * @param oldPeakMb peak of the old generation
	 * @param collections number of collections
	 * @param collectionMillis their accumulated time
	 */
	public record Usage(long cpuNanos, long peakMb, long oldPeakMb, long collections, long collectionMillis) {

		@Override
		public String toString() {
			return String.format("cpu %6.1f s | heap peak %,d MiB (old gen %,d), %d GCs %,d ms", this.cpuNanos / 1e9,
					this.peakMb, this.oldPeakMb, this.collections, this.collectionMillis);
		}

	}

}
