package org.assay.batches;

import java.io.Closeable;
import java.io.EOFException;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.lang.invoke.MethodHandles;
import java.lang.invoke.VarHandle;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;

import org.assay.geo.FeatureKind;

/**
 * A compact binary file of parsed features, written in pass 1 of an upload and read back
 * in pass 2, so that the GeoJSON is parsed once and never held in memory.
 *
 * <p>
 * Each row: sequence number, source id, kind, confidence, class, properties, WKB, box and
 * length; numbers big-endian, texts and the WKB as a 32-bit length (-1 for null) and
 * their bytes (UTF-8 for texts). Both ends keep their own buffer rather than a
 * {@code DataOutputStream} on a buffered stream, which pays a lock for every byte of
 * every number.
 */
final class FeatureSpool {

	private static final FeatureKind[] KINDS = FeatureKind.values();

	private static final int BUFFER = 1 << 16;

	private static final VarHandle INT = MethodHandles.byteArrayViewVarHandle(int[].class, ByteOrder.BIG_ENDIAN);

	private static final VarHandle LONG = MethodHandles.byteArrayViewVarHandle(long[].class, ByteOrder.BIG_ENDIAN);

	private FeatureSpool() {
	}

	/**
	 * One spooled feature.
	 */
	record Row(int seq, String sourceId, FeatureKind kind, double confidence, String featureClass, String properties,
			byte[] wkb, double minX, double minY, double maxX, double maxY, double lengthMetres) {
	}

	static Writer writer(Path path) throws IOException {
		return new Writer(path);
	}

	static Reader reader(Path path) throws IOException {
		return new Reader(path);
	}

	static final class Writer implements Closeable {

		private final OutputStream out;

		private final byte[] buffer = new byte[BUFFER];

		private int at;

		private Writer(Path path) throws IOException {
			this.out = Files.newOutputStream(path);
		}

		void write(Row row) throws IOException {
			writeInt(row.seq());
			writeString(row.sourceId());
			room(9);
			this.buffer[this.at++] = (byte) row.kind().ordinal();
			writeDouble(row.confidence());
			writeString(row.featureClass());
			writeString(row.properties());
			writeBytes(row.wkb());
			room(40);
			writeDouble(row.minX());
			writeDouble(row.minY());
			writeDouble(row.maxX());
			writeDouble(row.maxY());
			writeDouble(row.lengthMetres());
		}

		private void writeString(String value) throws IOException {
			writeBytes((value != null) ? value.getBytes(StandardCharsets.UTF_8) : null);
		}

		private void writeBytes(byte[] bytes) throws IOException {
			writeInt((bytes != null) ? bytes.length : -1);
			if (bytes == null) {
				return;
			}
			if (bytes.length > BUFFER - this.at) {
				flush();
				if (bytes.length > BUFFER) {
					this.out.write(bytes);
					return;
				}
			}
			System.arraycopy(bytes, 0, this.buffer, this.at, bytes.length);
			this.at += bytes.length;
		}

		private void writeInt(int value) throws IOException {
			room(4);
			INT.set(this.buffer, this.at, value);
			this.at += 4;
		}

		private void writeDouble(double value) throws IOException {
			room(8);
			LONG.set(this.buffer, this.at, Double.doubleToRawLongBits(value));
			this.at += 8;
		}

		private void room(int bytes) throws IOException {
			if (BUFFER - this.at < bytes) {
				flush();
			}
		}

		private void flush() throws IOException {
			this.out.write(this.buffer, 0, this.at);
			this.at = 0;
		}

		@Override
		public void close() throws IOException {
			try (this.out) {
				flush();
			}
		}

	}

	static final class Reader implements Closeable {

		private final InputStream in;

		private byte[] buffer = new byte[BUFFER];

		private int at;

		private int end;

		private Reader(Path path) throws IOException {
			this.in = Files.newInputStream(path);
		}

		/**
		 * Reads the next row.
		 * @return the row, or {@code null} at the end
		 */
		Row next() throws IOException {
			if (!fill(4)) {
				if (this.at < this.end) {
					throw new EOFException("The spool ends inside a row");
				}
				return null;
			}
			int seq = readInt();
			String sourceId = readString();
			need(9);
			FeatureKind kind = KINDS[this.buffer[this.at++]];
			double confidence = readDouble();
			String featureClass = readString();
			String properties = readString();
			byte[] wkb = readBytes();
			need(40);
			return new Row(seq, sourceId, kind, confidence, featureClass, properties, wkb, readDouble(), readDouble(),
					readDouble(), readDouble(), readDouble());
		}

		private String readString() throws IOException {
			int length = readLength();
			if (length < 0) {
				return null;
			}
			String value = new String(this.buffer, this.at, length, StandardCharsets.UTF_8);
			this.at += length;
			return value;
		}

		private byte[] readBytes() throws IOException {
			int length = readLength();
			if (length < 0) {
				return null;
			}
			byte[] bytes = Arrays.copyOfRange(this.buffer, this.at, this.at + length);
			this.at += length;
			return bytes;
		}

		/** Reads a length and makes sure that many bytes are in the buffer. */
		private int readLength() throws IOException {
			need(4);
			int length = readInt();
			if (length > 0) {
				need(length);
			}
			return length;
		}

		private int readInt() {
			int value = (int) INT.get(this.buffer, this.at);
			this.at += 4;
			return value;
		}

		private double readDouble() throws IOException {
			need(8);
			double value = Double.longBitsToDouble((long) LONG.get(this.buffer, this.at));
			this.at += 8;
			return value;
		}

		private void need(int bytes) throws IOException {
			if (!fill(bytes)) {
				throw new EOFException("The spool ends inside a row");
			}
		}

		/**
		 * Makes sure that the buffer holds some bytes from {@code at} on, growing it for
		 * a value larger than itself.
		 * @return false when the file ends first
		 */
		private boolean fill(int bytes) throws IOException {
			if (this.end - this.at >= bytes) {
				return true;
			}
			int kept = this.end - this.at;
			if (bytes > this.buffer.length) {
				this.buffer = Arrays.copyOfRange(this.buffer, this.at, this.at + Math.max(bytes, BUFFER));
			}
			else {
				System.arraycopy(this.buffer, this.at, this.buffer, 0, kept);
			}
			this.at = 0;
			this.end = kept;
			while (this.end < bytes) {
				int read = this.in.read(this.buffer, this.end, this.buffer.length - this.end);
				if (read < 0) {
					return false;
				}
				this.end += read;
			}
			return true;
		}

		@Override
		public void close() throws IOException {
			this.in.close();
		}

	}

}
