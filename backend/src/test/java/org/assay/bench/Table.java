package org.assay.bench;

import java.util.ArrayList;
import java.util.List;

/**
 * The figures of one benchmark run: a row per measured step, printed as it is added and
 * again as a table at the end, with the ratios of the uploads to their floors.
 */
final class Table {

	private static final double MB = 1e6;

	private final long drafts;

	private final long bytes;

	private final List<Row> rows = new ArrayList<>();

	Table(long drafts, long bytes) {
		this.drafts = drafts;
		this.bytes = bytes;
	}

	Row add(String name, UploadBenchmark.Timed timed) {
		return add(new Row(name, timed.nanos(), timed.usage(), ""));
	}

	Row add(String name, UploadRun.Result upload) {
		return add(new Row(name, upload.nanos(), upload.usage(), String.format("%s; %,d drafts stored in %,d cells",
				upload.stages(), upload.storedDrafts(), upload.cells())));
	}

	Row add(String name, CopyFloor.Result copy) {
		return add(new Row(name, copy.nanos(), copy.usage(),
				String.format("%,d rows, %,.0f MB of COPY data", copy.rows(), copy.bytes() / MB)));
	}

	private Row add(Row row) {
		this.rows.add(row);
		System.out.printf("%s: %s%n", row.name(), line(row));
		if (!row.note().isEmpty()) {
			System.out.println("    " + row.note());
		}
		return row;
	}

	private String line(Row row) {
		double seconds = row.nanos() / 1e9;
		return String.format("%7.2f s %,11.0f drafts/s %7.1f MB/s | %s", seconds, this.drafts / seconds,
				this.bytes / MB / seconds, row.usage());
	}

	/**
	 * Prints the table and the ratios. The floor of parsing is the faster of its two
	 * passes; rows that were not measured are {@code null}.
	 */
	void print(Row parseBefore, Row parseAfter, Row h2, Row postgres, Row copy, Row keyed) {
		System.out.printf(
				"%nResults: %,d drafts, %,.0f MB of GeoJSON (MB = 10^6 bytes; cpu = process CPU time; heap in MiB)%n",
				this.drafts, this.bytes / MB);
		for (Row row : this.rows) {
			System.out.printf("  %-46s %s%n", row.name(), line(row));
		}
		long parse = Math.min(parseBefore.nanos(), parseAfter.nanos());
		System.out.printf("Ratios (upload time / floor time; 1.0 is the floor, the aim is 2.0 or less):%n");
		if (h2 != null) {
			System.out.printf("  H2 upload / parse                         %5.2f%n", (double) h2.nanos() / parse);
		}
		if (postgres != null && copy != null) {
			System.out.printf("  PostgreSQL upload / (parse + COPY)        %5.2f%n",
					(double) postgres.nanos() / (parse + copy.nanos()));
			System.out.printf("  PostgreSQL upload / parse                 %5.2f%n", (double) postgres.nanos() / parse);
			System.out.printf("  (reference) PostgreSQL upload / (parse + COPY into a table with draft's keys) %5.2f%n",
					(double) postgres.nanos() / (parse + keyed.nanos()));
		}
	}

	/**
	 * One measured step.
	 *
	 * @param name what was measured
	 * @param nanos its time
	 * @param usage the CPU time and heap during it
	 * @param note details
	 */
	record Row(String name, long nanos, StepWatch.Usage usage, String note) {
	}

}
