package org.assay.bench;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.List;

import org.postgresql.PGConnection;
import org.postgresql.copy.CopyManager;

/**
 * The database's half of the upload floor on PostgreSQL: a binary COPY of exactly the
 * rows an upload stored into a fresh table with the draft table's columns, and nothing
 * else. The rows are first copied out of the uploaded batch into a file (not timed); the
 * timed part reads that file, sends it with the driver's CopyManager and commits.
 */
final class CopyFloor {

	static final String COLUMNS = "batch_id, cell_id, seq, source_id, kind, confidence, feature_class, geom,"
			+ " min_x, min_y, max_x, max_y, length_m, properties";

	private CopyFloor() {
	}

	/**
	 * Times the COPY, into a bare table (the floor) and, for reference, into a table with
	 * the indexes and foreign keys of the draft table, which the upload must also
	 * maintain.
	 * @param url the database that holds the uploaded batch
	 * @param user its user
	 * @param password the password
	 * @param batchId the uploaded batch
	 * @param work a folder for the rows file
	 * @return the bare COPY and the keyed one
	 */
	static List<Result> measure(String url, String user, String password, long batchId, Path work)
			throws SQLException, IOException {
		Path rows = work.resolve("draft-rows.pgcopy");
		try (Connection connection = DriverManager.getConnection(url, user, password)) {
			CopyManager copy = connection.unwrap(PGConnection.class).getCopyAPI();
			try (OutputStream out = Files.newOutputStream(rows)) {
				copy.copyOut("copy (select " + COLUMNS + " from draft where batch_id = " + batchId
						+ " order by id) to stdout (format binary)", out);
			}
			try (Statement statement = connection.createStatement()) {
				// the same columns as draft (with its identity), no indexes and no keys
				statement.execute("create table copy_floor (like draft including defaults including identity)");
				statement.execute("create table copy_keyed (like draft including all)");
				statement.execute("alter table copy_keyed add foreign key (batch_id) references batch (id)"
						+ " on delete cascade, add foreign key (cell_id) references cell (id) on delete cascade");
			}
			connection.setAutoCommit(false);
			return List.of(copy(copy, connection, "copy_floor", rows), copy(copy, connection, "copy_keyed", rows));
		}
		finally {
			Files.deleteIfExists(rows);
		}
	}

	private static Result copy(CopyManager copy, Connection connection, String table, Path rows)
			throws SQLException, IOException {
		StepWatch watch = new StepWatch();
		watch.start();
		long start = System.nanoTime();
		long copied;
		try (InputStream in = Files.newInputStream(rows)) {
			copied = copy.copyIn("copy " + table + " (" + COLUMNS + ") from stdin (format binary)", in, 1 << 16);
		}
		connection.commit();
		long nanos = System.nanoTime() - start;
		return new Result(nanos, watch.stop(), copied, Files.size(rows));
	}

	/**
	 * What the COPY measured.
	 *
	 * @param nanos the COPY and its commit
	 * @param usage the CPU time and heap during it
	 * @param rows the rows copied
	 * @param bytes the size of the binary COPY data
	 */
	record Result(long nanos, StepWatch.Usage usage, long rows, long bytes) {
	}

}
