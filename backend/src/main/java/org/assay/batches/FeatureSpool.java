package org.assay.batches;

import java.io.BufferedInputStream;
import java.io.BufferedOutputStream;
import java.io.Closeable;
import java.io.DataInputStream;
import java.io.DataOutputStream;
import java.io.EOFException;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import org.assay.geo.FeatureKind;

/**
 * A compact binary file of parsed features, written in pass 1 of an upload and read back
 * in pass 2, so that the GeoJSON is parsed once and never held in memory.
 */
final class FeatureSpool {

	private static final FeatureKind[] KINDS = FeatureKind.values();

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

		private final DataOutputStream out;

		private Writer(Path path) throws IOException {
			this.out = new DataOutputStream(new BufferedOutputStream(Files.newOutputStream(path), 1 << 16));
		}

		void write(Row row) throws IOException {
			this.out.writeInt(row.seq());
			writeString(row.sourceId());
			this.out.writeByte(row.kind().ordinal());
			this.out.writeDouble(row.confidence());
			writeString(row.featureClass());
			writeString(row.properties());
			this.out.writeInt(row.wkb().length);
			this.out.write(row.wkb());
			this.out.writeDouble(row.minX());
			this.out.writeDouble(row.minY());
			this.out.writeDouble(row.maxX());
			this.out.writeDouble(row.maxY());
			this.out.writeDouble(row.lengthMetres());
		}

		private void writeString(String value) throws IOException {
			if (value == null) {
				this.out.writeInt(-1);
				return;
			}
			byte[] bytes = value.getBytes(StandardCharsets.UTF_8);
			this.out.writeInt(bytes.length);
			this.out.write(bytes);
		}

		@Override
		public void close() throws IOException {
			this.out.close();
		}

	}

	static final class Reader implements Closeable {

		private final DataInputStream in;

		private Reader(Path path) throws IOException {
			this.in = new DataInputStream(new BufferedInputStream(Files.newInputStream(path), 1 << 16));
		}

		/**
		 * Reads the next row.
		 * @return the row, or {@code null} at the end
		 */
		Row next() throws IOException {
			int seq;
			try {
				seq = this.in.readInt();
			}
			catch (EOFException ex) {
				return null;
			}
			String sourceId = readString();
			FeatureKind kind = KINDS[this.in.readByte()];
			double confidence = this.in.readDouble();
			String featureClass = readString();
			String properties = readString();
			byte[] wkb = new byte[this.in.readInt()];
			this.in.readFully(wkb);
			return new Row(seq, sourceId, kind, confidence, featureClass, properties, wkb, this.in.readDouble(),
					this.in.readDouble(), this.in.readDouble(), this.in.readDouble(), this.in.readDouble());
		}

		private String readString() throws IOException {
			int length = this.in.readInt();
			if (length < 0) {
				return null;
			}
			byte[] bytes = new byte[length];
			this.in.readFully(bytes);
			return new String(bytes, StandardCharsets.UTF_8);
		}

		@Override
		public void close() throws IOException {
			this.in.close();
		}

	}

}
