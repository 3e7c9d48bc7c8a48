package org.assay.batches;

import java.lang.invoke.MethodHandles;
import java.lang.invoke.VarHandle;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.sql.Connection;
import java.sql.SQLException;

import org.postgresql.PGConnection;
import org.postgresql.copy.CopyIn;

/**
 * Sends rows to a PostgreSQL {@code COPY ... FROM STDIN (FORMAT binary)} through a fixed
 * buffer, so that any number of rows costs constant memory. The format is that of the
 * PostgreSQL documentation (COPY, "Binary Format"): a signature and header, then per row
 * a 16-bit field count and per field a 32-bit length (-1 for null) and the value in its
 * type's binary form (network byte order); a count of -1 ends the data.
 *
 * <p>
 * Runs on the caller's connection, so inside its transaction. Closing an unfinished copy
 * cancels it, which leaves the connection usable for the rollback.
 */
final class BinaryCopy implements AutoCloseable {

	private static final byte[] HEADER = { 'P', 'G', 'C', 'O', 'P', 'Y', '\n', (byte) 0xff, '\r', '\n', 0,
			// flags, then the length of the header extension
			0, 0, 0, 0, 0, 0, 0, 0 };

	private static final VarHandle SHORT = MethodHandles.byteArrayViewVarHandle(short[].class, ByteOrder.BIG_ENDIAN);

	private static final VarHandle INT = MethodHandles.byteArrayViewVarHandle(int[].class, ByteOrder.BIG_ENDIAN);

	private static final VarHandle LONG = MethodHandles.byteArrayViewVarHandle(long[].class, ByteOrder.BIG_ENDIAN);

	private final CopyIn copy;

	private final byte[] buffer = new byte[1 << 16];

	private int at;

	private BinaryCopy(CopyIn copy) {
		this.copy = copy;
	}

	/**
	 * Starts a COPY into some columns of a table.
	 * @param connection the connection, a PostgreSQL one or a wrapper of it
	 * @param table the table
	 * @param columns the columns, comma-separated, in the order of each row's fields
	 * @return the copy
	 */
	static BinaryCopy start(Connection connection, String table, String columns) throws SQLException {
		CopyIn copy = connection.unwrap(PGConnection.class)
			.getCopyAPI()
			.copyIn("copy " + table + " (" + columns + ") from stdin (format binary)");
		BinaryCopy rows = new BinaryCopy(copy);
		rows.put(HEADER);
		return rows;
	}

	/** Starts a row of some fields. */
	void row(int fields) throws SQLException {
		room(2);
		SHORT.set(this.buffer, this.at, (short) fields);
		this.at += 2;
	}

	/** A {@code bigint}. */
	void int8(long value) throws SQLException {
		room(12);
		INT.set(this.buffer, this.at, 8);
		LONG.set(this.buffer, this.at + 4, value);
		this.at += 12;
	}

	/** An {@code integer}. */
	void int4(int value) throws SQLException {
		room(8);
		INT.set(this.buffer, this.at, 4);
		INT.set(this.buffer, this.at + 4, value);
		this.at += 8;
	}

	/** A {@code double precision}. */
	void float8(double value) throws SQLException {
		room(12);
		INT.set(this.buffer, this.at, 8);
		LONG.set(this.buffer, this.at + 4, Double.doubleToRawLongBits(value));
		this.at += 12;
	}

	/** Text ({@code varchar}, {@code text}) as UTF-8, the driver's client encoding. */
	void text(String value) throws SQLException {
		bytes((value != null) ? value.getBytes(StandardCharsets.UTF_8) : null);
	}

	/** A {@code bytea}, or with text's bytes any text type; null for SQL NULL. */
	void bytes(byte[] value) throws SQLException {
		room(4);
		INT.set(this.buffer, this.at, (value != null) ? value.length : -1);
		this.at += 4;
		if (value != null) {
			put(value);
		}
	}

	/**
	 * Ends the data and the COPY.
	 * @return the number of rows the server took
	 */
	long finish() throws SQLException {
		room(2);
		SHORT.set(this.buffer, this.at, (short) -1);
		this.at += 2;
		flush();
		return this.copy.endCopy();
	}

	@Override
	public void close() throws SQLException {
		if (this.copy.isActive()) {
			this.copy.cancelCopy();
		}
	}

	private void put(byte[] bytes) throws SQLException {
		if (bytes.length > this.buffer.length - this.at) {
			flush();
			if (bytes.length > this.buffer.length) {
				this.copy.writeToCopy(bytes, 0, bytes.length);
				return;
			}
		}
		System.arraycopy(bytes, 0, this.buffer, this.at, bytes.length);
		this.at += bytes.length;
	}

	private void room(int bytes) throws SQLException {
		if (this.buffer.length - this.at < bytes) {
			flush();
		}
	}

	private void flush() throws SQLException {
		if (this.at > 0) {
			this.copy.writeToCopy(this.buffer, 0, this.at);
			this.at = 0;
		}
	}

}
