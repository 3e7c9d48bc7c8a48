package org.assay.batches;

import java.io.EOFException;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import org.assay.geo.FeatureKind;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatExceptionOfType;

/**
 * Tests for {@link FeatureSpool}: rows read back as written, across its buffer's edges.
 */
class FeatureSpoolTests {

	@TempDir
	Path folder;

	@Test
	void rowsReadBackAsWrittenWithNullsNonAsciiAndValuesLargerThanTheBuffer() throws IOException {
		List<FeatureSpool.Row> rows = new ArrayList<>();
		for (int i = 0; i < 5_000; i++) {
			rows.add(row(i, "d-" + i, "{\"name\":\"Straße ✓ " + i + "\"}", new byte[20 + i % 300]));
		}
		rows.add(row(5_000, null, null, new byte[0]));
		rows.add(row(5_001, "big", "x".repeat(200_000), new byte[300_000]));
		rows.add(row(5_002, "after", "{}", new byte[] { 1, 2, 3 }));
		Path spool = this.folder.resolve("rows.spool");
		try (FeatureSpool.Writer writer = FeatureSpool.writer(spool)) {
			for (FeatureSpool.Row row : rows) {
				writer.write(row);
			}
		}
		List<FeatureSpool.Row> read = new ArrayList<>();
		try (FeatureSpool.Reader reader = FeatureSpool.reader(spool)) {
			for (FeatureSpool.Row row = reader.next(); row != null; row = reader.next()) {
				read.add(row);
			}
		}
		assertThat(read).hasSameSizeAs(rows);
		for (int i = 0; i < rows.size(); i++) {
			FeatureSpool.Row expected = rows.get(i);
			FeatureSpool.Row actual = read.get(i);
			assertThat(actual).usingRecursiveComparison().ignoringFields("wkb").isEqualTo(expected);
			assertThat(actual.wkb()).isEqualTo(expected.wkb());
		}
	}

	@Test
	void aSpoolCutInsideARowIsAnError() throws IOException {
		Path spool = this.folder.resolve("cut.spool");
		try (FeatureSpool.Writer writer = FeatureSpool.writer(spool)) {
			writer.write(row(0, "a", "{}", new byte[10]));
		}
		byte[] bytes = Files.readAllBytes(spool);
		Files.write(spool, Arrays.copyOf(bytes, bytes.length - 3));
		try (FeatureSpool.Reader reader = FeatureSpool.reader(spool)) {
			assertThatExceptionOfType(EOFException.class).isThrownBy(reader::next);
		}
	}

	private static FeatureSpool.Row row(int seq, String id, String properties, byte[] wkb) {
		for (int i = 0; i < wkb.length; i++) {
			wkb[i] = (byte) (seq + i);
		}
		return new FeatureSpool.Row(seq, id, (seq % 2 == 0) ? FeatureKind.ROAD : FeatureKind.BUILDING, seq / 10_000.0,
				(seq % 3 == 0) ? null : "class-" + seq, properties, wkb, -seq, seq * 0.5, seq + 1e-9, Double.MAX_VALUE,
				seq * 17.25);
	}

}
