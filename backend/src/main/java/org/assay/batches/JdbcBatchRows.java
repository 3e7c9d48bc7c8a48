package org.assay.batches;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.SQLException;
import java.sql.Types;
import java.util.function.IntConsumer;

import org.springframework.jdbc.core.JdbcTemplate;

/**
 * Writes features with JDBC batches of {@value #BATCH_SIZE} rows: the way for H2 and any
 * database without a faster bulk path.
 */
final class JdbcBatchRows implements FeatureRows {

	private static final int BATCH_SIZE = 1000;

	private static final String INSERT_DRAFT = "insert into draft (" + DRAFT_COLUMNS + ")"
			+ " values (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)";

	private static final String INSERT_REFERENCE = "insert into reference_feature (" + REFERENCE_COLUMNS + ")"
			+ " values (?, ?, ?, ?, ?, ?, ?, ?, ?, ?)";

	private final JdbcTemplate jdbc;

	JdbcBatchRows(JdbcTemplate jdbc) {
		this.jdbc = jdbc;
	}

	@Override
	public void insertDrafts(long batchId, Path spool, int[] cellOfDraft, long[] cellIds, UploadChecks checks,
			IntConsumer progress) {
		this.jdbc.execute((Connection connection) -> {
			try (PreparedStatement ps = connection.prepareStatement(INSERT_DRAFT);
					FeatureSpool.Reader reader = FeatureSpool.reader(spool)) {
				int index = 0;
				for (FeatureSpool.Row row = reader.next(); row != null; row = reader.next()) {
					ps.setLong(1, batchId);
					ps.setLong(2, cellIds[cellOfDraft[index]]);
					ps.setInt(3, row.seq());
					ps.setString(4, row.sourceId());
					ps.setString(5, row.kind().jsonName());
					ps.setDouble(6, row.confidence());
					ps.setString(7, row.featureClass());
					ps.setBytes(8, row.wkb());
					setBox(ps, 9, row);
					ps.setDouble(13, row.lengthMetres());
					ps.setString(14, row.properties());
					ps.setDouble(15, checks.risk(index));
					ps.setString(16, checks.flags(index));
					ps.addBatch();
					index++;
					if (index % BATCH_SIZE == 0) {
						ps.executeBatch();
					}
					if (index % PROGRESS_EVERY == 0) {
						progress.accept(index);
					}
				}
				ps.executeBatch();
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
		return this.jdbc.execute((Connection connection) -> {
			try (PreparedStatement ps = connection.prepareStatement(INSERT_REFERENCE);
					FeatureSpool.Reader reader = FeatureSpool.reader(spool)) {
				int count = 0;
				for (FeatureSpool.Row row = reader.next(); row != null; row = reader.next()) {
					ps.setLong(1, batchId);
					ps.setInt(2, row.seq());
					ps.setString(3, row.sourceId());
					ps.setString(4, row.kind().jsonName());
					ps.setBytes(5, row.wkb());
					setBox(ps, 6, row);
					if (row.properties() != null) {
						ps.setString(10, row.properties());
					}
					else {
						ps.setNull(10, Types.VARCHAR);
					}
					ps.addBatch();
					count++;
					if (count % BATCH_SIZE == 0) {
						ps.executeBatch();
					}
				}
				ps.executeBatch();
				return count;
			}
			catch (IOException ex) {
				throw new UncheckedIOException(ex);
			}
		});
	}

	private static void setBox(PreparedStatement ps, int first, FeatureSpool.Row row) throws SQLException {
		ps.setDouble(first, row.minX());
		ps.setDouble(first + 1, row.minY());
		ps.setDouble(first + 2, row.maxX());
		ps.setDouble(first + 3, row.maxY());
	}

}
