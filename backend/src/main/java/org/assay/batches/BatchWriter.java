package org.assay.batches;

import java.nio.file.Path;
import java.sql.PreparedStatement;
import java.sql.SQLException;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.function.IntConsumer;

import org.assay.cells.CellBox;
import org.assay.cells.CellPlan;
import org.assay.checks.FlagKind;
import org.locationtech.jts.geom.Envelope;

import org.springframework.jdbc.core.BatchPreparedStatementSetter;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.jdbc.support.GeneratedKeyHolder;
import org.springframework.jdbc.support.KeyHolder;

/**
 * Pass 2 of an upload: writes the batch, its cells, its drafts and its reference layer
 * (the features in bulk, see {@link FeatureRows}: COPY on PostgreSQL, JDBC batches
 * elsewhere). Runs inside the caller's transaction, so that on any failure nothing of the
 * batch is stored.
 */
final class BatchWriter {

	private final JdbcTemplate jdbc;

	private volatile FeatureRows rows;

	BatchWriter(JdbcTemplate jdbc) {
		this.jdbc = jdbc;
	}

	long insertBatch(UploadSettings settings, long createdBy, int draftCount, int cellCount, int referenceCount,
			Envelope extent, String checkSettings) {
		KeyHolder keys = new GeneratedKeyHolder();
		this.jdbc.update((connection) -> {
			PreparedStatement ps = connection.prepareStatement("insert into batch (name, model_name, model_version,"
					+ " imagery_url, reason_catalogue, state, created_by, created_at, max_drafts_per_cell,"
					+ " max_road_km_per_cell, lease_minutes, draft_count, cell_count, reference_count,"
					+ " min_x, min_y, max_x, max_y, check_settings, queue_order, queue_seed, second_share,"
					+ " second_seed) values (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)",
					new String[] { "id" });
			ps.setString(1, settings.name());
			ps.setString(2, settings.modelName());
			ps.setString(3, settings.modelVersion());
			ps.setString(4, settings.imageryUrl());
			ps.setString(5, settings.reasonCatalogue());
			ps.setString(6, BatchState.OPEN.name());
			ps.setLong(7, createdBy);
			ps.setObject(8, OffsetDateTime.now(ZoneOffset.UTC));
			ps.setInt(9, settings.maxDraftsPerCell());
			ps.setDouble(10, settings.maxRoadKmPerCell());
			ps.setInt(11, settings.leaseMinutes());
			ps.setInt(12, draftCount);
			ps.setInt(13, cellCount);
			ps.setInt(14, referenceCount);
			ps.setDouble(15, extent.getMinX());
			ps.setDouble(16, extent.getMinY());
			ps.setDouble(17, extent.getMaxX());
			ps.setDouble(18, extent.getMaxY());
			ps.setString(19, checkSettings);
			ps.setString(20, settings.queueOrder().apiName());
			ps.setLong(21, settings.queueSeed());
			ps.setDouble(22, settings.secondShare());
			ps.setLong(23, settings.secondSeed());
			return ps;
		}, keys);
		return keys.getKeyAs(Number.class).longValue();
	}

	/**
	 * Inserts the cells of a plan.
	 * @return the cell ids, by index in the plan
	 */
	long[] insertCells(long batchId, CellPlan plan, double[] risk, int[] rank) {
		return insertCells(batchId, plan, risk, rank, new boolean[plan.cells().size()]);
	}

	long[] insertCells(long batchId, CellPlan plan, double[] risk, int[] rank, boolean[] twice) {
		List<CellBox> cells = plan.cells();
		this.jdbc.batchUpdate("insert into cell (batch_id, seq, min_x, min_y, max_x, max_y, draft_count,"
				+ " road_length_m, over_limit, decided_count, version, risk, queue_rank, second_review)"
				+ " values (?, ?, ?, ?, ?, ?, ?, ?, ?, 0, 0, ?, ?, ?)", new BatchPreparedStatementSetter() {

					@Override
					public void setValues(PreparedStatement ps, int i) throws SQLException {
						CellBox cell = cells.get(i);
						ps.setLong(1, batchId);
						ps.setInt(2, i);
						ps.setDouble(3, cell.minX());
						ps.setDouble(4, cell.minY());
						ps.setDouble(5, cell.maxX());
						ps.setDouble(6, cell.maxY());
						ps.setInt(7, cell.draftCount());
						ps.setDouble(8, cell.roadMetres());
						ps.setBoolean(9, cell.overLimit());
						ps.setDouble(10, risk[i]);
						ps.setInt(11, rank[i]);
						ps.setBoolean(12, twice[i]);
					}

					@Override
					public int getBatchSize() {
						return cells.size();
					}

				});
		long[] ids = new long[cells.size()];
		this.jdbc.query("select id, seq from cell where batch_id = ?", (rs) -> {
			ids[rs.getInt(2)] = rs.getLong(1);
		}, batchId);
		return ids;
	}

	/**
	 * Writes the drafts from their spool; see {@link FeatureRows#insertDrafts}.
	 */
	void insertDrafts(long batchId, Path spool, int[] cellOfDraft, long[] cellIds, UploadChecks checks,
			IntConsumer progress) {
		rows().insertDrafts(batchId, spool, cellOfDraft, cellIds, checks, progress);
	}

	/**
	 * Writes how many drafts carry each kind of flag.
	 */
	void insertFlagCounts(long batchId, Map<FlagKind, Integer> counts) {
		List<Object[]> rows = new ArrayList<>();
		counts.forEach((kind, drafts) -> rows.add(new Object[] { batchId, kind.code(), drafts }));
		this.jdbc.batchUpdate("insert into batch_flag_count (batch_id, code, drafts) values (?, ?, ?)", rows);
	}

	/**
	 * Writes the reference features from their spool.
	 * @return the number written
	 */
	int insertReference(long batchId, Path spool) {
		return rows().insertReference(batchId, spool);
	}

	void setReferenceCount(long batchId, int count) {
		this.jdbc.update("update batch set reference_count = ? where id = ?", count, batchId);
	}

	/** Chosen at the first upload, when the database is surely reachable. */
	private FeatureRows rows() {
		FeatureRows chosen = this.rows;
		if (chosen == null) {
			chosen = FeatureRows.forDatabase(this.jdbc);
			this.rows = chosen;
		}
		return chosen;
	}

}
