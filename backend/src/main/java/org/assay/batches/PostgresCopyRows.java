package org.assay.batches;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.SQLException;
import java.util.function.IntConsumer;

import org.assay.geo.FeatureKind;

import org.springframework.jdbc.core.JdbcTemplate;

/**
 * Writes features to PostgreSQL with one binary COPY per table (the driver's
 * CopyManager), streamed from the spool: the fastest way in, several times faster than
 * JDBC batches.
 */
final class PostgresCopyRows implements FeatureRows {

	private static final byte[][] KIND = kindNames();

	private final JdbcTemplate jdbc;

	PostgresCopyRows(JdbcTemplate jdbc) {
		this.jdbc = jdbc;
	}

	@Override
	public void insertDrafts(long batchId, Path spool, int[] cellOfDraft, long[] cellIds, UploadChecks checks,
			IntConsumer progress) {
		this.jdbc.execute((Connection connection) -> {
			try (FeatureSpool.Reader reader = FeatureSpool.reader(spool);
					BinaryCopy copy = BinaryCopy.start(connection, "draft", DRAFT_COLUMNS)) {
				int index = 0;
				for (FeatureSpool.Row row = reader.next(); row != null; row = reader.next()) {
					copy.row(16);
					copy.int8(batchId);
					copy.int8(cellIds[cellOfDraft[index]]);
					copy.int4(row.seq());
					copy.text(row.sourceId());
					copy.bytes(KIND[row.kind().ordinal()]);
					copy.float8(row.confidence());
					copy.text(row.featureClass());
					copy.bytes(row.wkb());
					box(copy, row);
					copy.float8(row.lengthMetres());
					copy.text(row.properties());
					copy.float8(checks.risk(index));
					copy.text(checks.flags(index));
					index++;
					if (index % PROGRESS_EVERY == 0) {
						progress.accept(index);
					}
				}
				copy.finish();
				progress.accept(index);
				return null;
			}
			catch (IOException ex) {
				throw new UncheckedIOException(ex);
			}
		});
	}

	@Override
	public int insertReference(long batchId, Path spool) {
		Long count = this.jdbc.execute((Connection connection) -> {
			try (FeatureSpool.Reader reader = FeatureSpool.reader(spool);
					BinaryCopy copy = BinaryCopy.start(connection, "reference_feature", REFERENCE_COLUMNS)) {
				for (FeatureSpool.Row row = reader.next(); row != null; row = reader.next()) {
					copy.row(10);
					copy.int8(batchId);
					copy.int4(row.seq());
					copy.text(row.sourceId());
					copy.bytes(KIND[row.kind().ordinal()]);
					copy.bytes(row.wkb());
					box(copy, row);
					copy.text(row.properties());
				}
				return copy.finish();
			}
			catch (IOException ex) {
				throw new UncheckedIOException(ex);
			}
		});
		return Math.toIntExact(count);
	}

	private static void box(BinaryCopy copy, FeatureSpool.Row row) throws SQLException {
		copy.float8(row.minX());
		copy.float8(row.minY());
		copy.float8(row.maxX());
		copy.float8(row.maxY());
	}

	private static byte[][] kindNames() {
		FeatureKind[] kinds = FeatureKind.values();
		byte[][] names = new byte[kinds.length][];
		for (FeatureKind kind : kinds) {
			names[kind.ordinal()] = kind.jsonName().getBytes(StandardCharsets.UTF_8);
		}
		return names;
	}

}
