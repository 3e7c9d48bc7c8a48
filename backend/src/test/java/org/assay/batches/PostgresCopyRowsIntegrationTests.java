package org.assay.batches;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;

import org.assay.cells.CellBox;
import org.assay.cells.CellPlan;
import org.assay.geo.FeatureKind;
import org.assay.geo.Wkb;
import org.assay.support.PostgresDatabase;
import org.flywaydb.core.Flyway;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.io.ParseException;
import org.locationtech.jts.io.WKTReader;

import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.jdbc.datasource.DataSourceTransactionManager;
import org.springframework.jdbc.datasource.DriverManagerDataSource;
import org.springframework.transaction.support.TransactionTemplate;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatException;

/**
 * The binary COPY of {@link PostgresCopyRows} on a real PostgreSQL server: what it writes
 * reads back exactly as the JDBC batches of {@link JdbcBatchRows} write it, and as the
 * spool held it. The rows carry what text-format COPY and careless encoding get wrong:
 * non-ASCII text, quotes, backslashes, tabs and newlines, the text {@code \N}, and nulls.
 */
class PostgresCopyRowsIntegrationTests {

	private static final String READ_BACK = "select d.seq, d.source_id, d.kind, d.confidence, d.feature_class, d.geom,"
			+ " d.min_x, d.min_y, d.max_x, d.max_y, d.length_m, d.properties, c.seq as cell_seq"
			+ " from draft d join cell c on c.id = d.cell_id where d.batch_id = ? order by d.seq";

	private static final String READ_REFERENCE = "select seq, source_id, kind, geom, min_x, min_y, max_x, max_y,"
			+ " properties from reference_feature where batch_id = ? order by seq";

	private static PostgresDatabase database;

	private static JdbcTemplate jdbc;

	private static TransactionTemplate transaction;

	private static long leadId;

	@TempDir
	Path folder;

	@BeforeAll
	static void migrate() {
		database = PostgresDatabase.create();
		DriverManagerDataSource dataSource = new DriverManagerDataSource(database.url(), database.user(),
				database.password());
		Flyway.configure().dataSource(dataSource).locations("classpath:db/migration").load().migrate();
		jdbc = new JdbcTemplate(dataSource);
		transaction = new TransactionTemplate(new DataSourceTransactionManager(dataSource));
		jdbc.update("insert into app_user (username, display_name, password_hash, role, enabled, created_at)"
				+ " values ('lead', 'Lead', 'x', 'LEAD', true, current_timestamp)");
		leadId = jdbc.queryForObject("select id from app_user where username = 'lead'", Long.class);
	}

	@AfterAll
	static void drop() {
		if (database != null) {
			database.drop();
		}
	}

	@Test
	void copiedDraftsReadBackAsTheSpoolHeldThemAndAsJdbcBatchesWriteThem() {
		List<FeatureSpool.Row> rows = rows();
		Path spool = spool(rows);
		long copied = writeBatch(new PostgresCopyRows(jdbc), spool, rows.size());
		long batched = writeBatch(new JdbcBatchRows(jdbc), spool, rows.size());

		List<Map<String, Object>> viaCopy = jdbc.queryForList(READ_BACK, copied);
		List<Map<String, Object>> viaBatches = jdbc.queryForList(READ_BACK, batched);
		assertThat(viaCopy).hasSize(rows.size());
		for (int i = 0; i < rows.size(); i++) {
			FeatureSpool.Row row = rows.get(i);
			Map<String, Object> stored = viaCopy.get(i);
			assertThat(stored.get("seq")).isEqualTo(row.seq());
			assertThat(stored.get("source_id")).isEqualTo(row.sourceId());
			assertThat(stored.get("kind")).isEqualTo(row.kind().jsonName());
			assertThat(stored.get("confidence")).isEqualTo(row.confidence());
			assertThat(stored.get("feature_class")).isEqualTo(row.featureClass());
			assertThat((byte[]) stored.get("geom")).isEqualTo(row.wkb());
			assertThat(List.of(stored.get("min_x"), stored.get("min_y"), stored.get("max_x"), stored.get("max_y")))
				.containsExactly(row.minX(), row.minY(), row.maxX(), row.maxY());
			assertThat(stored.get("length_m")).isEqualTo(row.lengthMetres());
			assertThat(stored.get("properties")).isEqualTo(row.properties());
			assertThat(stored.get("cell_seq")).isEqualTo(i % 2);
		}
		assertSameRows(viaCopy, viaBatches);
	}

	@Test
	void copiedReferenceFeaturesReadBackAsJdbcBatchesWriteThem() {
		List<FeatureSpool.Row> rows = rows();
		Path spool = spool(rows);
		long copied = writeBatch(new PostgresCopyRows(jdbc), spool, 0);
		long batched = writeBatch(new JdbcBatchRows(jdbc), spool, 0);
		int copiedCount = transaction
			.execute((tx) -> new PostgresCopyRows(jdbc).insertReference(copied, spool(rows, "reference")));
		int batchedCount = transaction
			.execute((tx) -> new JdbcBatchRows(jdbc).insertReference(batched, spool(rows, "reference")));

		assertThat(copiedCount).isEqualTo(batchedCount).isEqualTo(rows.size());
		assertSameRows(jdbc.queryForList(READ_REFERENCE, copied), jdbc.queryForList(READ_REFERENCE, batched));
		assertThat(jdbc.queryForList(READ_REFERENCE, copied).get(0).get("properties"))
			.isEqualTo(rows.get(0).properties());
	}

	@Test
	void aFailedCopyLeavesNothingAndTheConnectionUsable() {
		List<FeatureSpool.Row> rows = rows();
		Path spool = spool(rows);
		Integer before = jdbc.queryForObject("select count(*) from draft", Integer.class);
		// a cell id that does not exist breaks the foreign key in the middle of the COPY
		assertThatException().isThrownBy(() -> transaction.executeWithoutResult((tx) -> new PostgresCopyRows(jdbc)
			.insertDrafts(batchRow(), spool, new int[rows.size()], new long[] { -1 }, checks(rows.size()), (count) -> {
			})));
		assertThat(jdbc.queryForObject("select count(*) from draft", Integer.class)).isEqualTo(before);
	}

	private static void assertSameRows(List<Map<String, Object>> actual, List<Map<String, Object>> expected) {
		assertThat(actual).hasSameSizeAs(expected);
		for (int i = 0; i < actual.size(); i++) {
			for (String column : expected.get(i).keySet()) {
				Object value = actual.get(i).get(column);
				Object wanted = expected.get(i).get(column);
				if (wanted instanceof byte[] bytes) {
					assertThat((byte[]) value).as(column).isEqualTo(bytes);
				}
				else {
					assertThat(value).as(column).isEqualTo(wanted);
				}
			}
		}
	}

	/** Writes a batch with two cells and its drafts, the odd ones in the second cell. */
	private long writeBatch(FeatureRows way, Path spool, int drafts) {
		return transaction.execute((tx) -> {
			BatchWriter writer = new BatchWriter(jdbc);
			long batch = batchRow();
			int[] cellOfDraft = new int[drafts];
			for (int i = 0; i < drafts; i++) {
				cellOfDraft[i] = i % 2;
			}
			long[] cellIds = writer.insertCells(batch, new CellPlan(List.of(cell(), cell()), cellOfDraft),
					new double[] { 0.5, 0.25 }, new int[] { 1, 0 });
			if (drafts > 0) {
				way.insertDrafts(batch, spool, cellOfDraft, cellIds, checks(drafts), (count) -> {
				});
			}
			return batch;
		});
	}

	private static long batchRow() {
		UploadSettings settings = new UploadSettings("copy test", "model", "1", null, 60, 15, 30, "standard");
		return new BatchWriter(jdbc).insertBatch(settings, leadId, 0, 0, 0, new Envelope(0, 1, 0, 1), "{}");
	}

	/**
	 * Risks and flags that differ from draft to draft; every third draft has no flags.
	 */
	private static UploadChecks checks(int drafts) {
		double[] risk = new double[drafts];
		String[] flags = new String[drafts];
		for (int i = 0; i < drafts; i++) {
			risk[i] = i / (double) (drafts + 1);
			flags[i] = (i % 3 == 0) ? null : "[{\"code\":\"spike\",\"values\":{\"turnDegrees\":" + i + "}}]";
		}
		return UploadChecks.of(risk, flags, new int[drafts], 1);
	}

	private static CellBox cell() {
		return new CellBox(0, 0, 1, 1, 1, 0, false);
	}

	private Path spool(List<FeatureSpool.Row> rows) {
		return spool(rows, "drafts");
	}

	private Path spool(List<FeatureSpool.Row> rows, String name) {
		Path path = this.folder.resolve(name + ".spool");
		try (FeatureSpool.Writer writer = FeatureSpool.writer(path)) {
			for (FeatureSpool.Row row : rows) {
				writer.write(row);
			}
		}
		catch (IOException ex) {
			throw new UncheckedIOException(ex);
		}
		return path;
	}

	private static List<FeatureSpool.Row> rows() {
		return List.of(
				row(0, "r-1", FeatureKind.ROAD, 0.1234567890123, "track",
						"{\"kind\":\"road\",\"name\":\"Straße \\\"Nord\\\" \\\\ süd — ✓ 🛣\","
								+ "\"note\":\"tab\\there\\nnew line \\\\N\"}",
						"LINESTRING (13.4 52.5, 13.4002 52.5001, 13.4005 52.4999)", 41.123456789012345),
				row(1, null, FeatureKind.BUILDING, 0.0, null, null,
						"POLYGON ((0 0, 0.001 0, 0.001 0.001, 0 0.001, 0 0), (0.0002 0.0002, 0.0002 0.0004,"
								+ " 0.0004 0.0004, 0.0004 0.0002, 0.0002 0.0002))",
						0),
				row(2, "ü-2 'quoted' \"double\" back\\slash", FeatureKind.ROAD, 1.0, "class, with comma\ttab", "{}",
						"MULTILINESTRING ((-31.7 40.9, -31.699 40.9), (-31.6 40.8, -31.59 40.81))", 1e-300),
				row(3, "\\N", FeatureKind.ROAD, 0.5, "\\N", "\\N", "LINESTRING (179.999 -89.9, -179.999 -89.8)",
						Double.MIN_VALUE));
	}

	private static FeatureSpool.Row row(int seq, String sourceId, FeatureKind kind, double confidence,
			String featureClass, String properties, String wkt, double length) {
		Geometry geometry = geometry(wkt);
		Envelope box = geometry.getEnvelopeInternal();
		return new FeatureSpool.Row(seq, sourceId, kind, confidence, featureClass, properties, Wkb.write(geometry),
				box.getMinX(), box.getMinY(), box.getMaxX(), box.getMaxY(), length);
	}

	private static Geometry geometry(String wkt) {
		try {
			return new WKTReader(Wkb.WGS84).read(wkt);
		}
		catch (ParseException ex) {
			throw new IllegalArgumentException(ex);
		}
	}

}
