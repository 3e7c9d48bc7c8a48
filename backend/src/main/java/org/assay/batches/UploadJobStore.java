package org.assay.batches;

import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.util.Map;
import java.util.Optional;
import java.util.UUID;

import tools.jackson.core.type.TypeReference;
import tools.jackson.databind.ObjectMapper;

import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.stereotype.Component;
import org.springframework.transaction.PlatformTransactionManager;
import org.springframework.transaction.TransactionDefinition;
import org.springframework.transaction.support.TransactionTemplate;

/**
 * The rows of the {@code upload_job} table. Each write commits at once (no surrounding
 * transaction), so that progress is visible while the batch's own transaction runs.
 */
@Component
class UploadJobStore {

	private final JdbcTemplate jdbc;

	private final ObjectMapper json;

	private final TransactionTemplate separately;

	UploadJobStore(JdbcTemplate jdbc, ObjectMapper json, PlatformTransactionManager transactions) {
		this.jdbc = jdbc;
		this.json = json;
		this.separately = new TransactionTemplate(transactions);
		this.separately.setPropagationBehavior(TransactionDefinition.PROPAGATION_REQUIRES_NEW);
	}

	private void write(String sql, Object... args) {
		this.separately.executeWithoutResult((tx) -> this.jdbc.update(sql, args));
	}

	void create(UUID id, long createdBy, long bytesTotal) {
		OffsetDateTime now = now();
		write("insert into upload_job (id, created_by, created_at, updated_at, state, stage, bytes_total,"
				+ " drafts_parsed, cells_made) values (?, ?, ?, ?, ?, 'received', ?, 0, 0)", id, createdBy, now, now,
				UploadStatus.State.QUEUED.name(), bytesTotal);
	}

	void progress(UUID id, String stage, long drafts, int cells) {
		write("update upload_job set state = ?, stage = ?, drafts_parsed = ?, cells_made = ?,"
				+ " updated_at = ? where id = ?", UploadStatus.State.RUNNING.name(), stage, drafts, cells, now(), id);
	}

	void done(UUID id, long batchId, long drafts, int cells) {
		write("update upload_job set state = ?, stage = 'done', drafts_parsed = ?, cells_made = ?,"
				+ " batch_id = ?, updated_at = ? where id = ?", UploadStatus.State.DONE.name(), drafts, cells, batchId,
				now(), id);
	}

	void failed(UUID id, Map<String, Object> problem) {
		write("update upload_job set state = ?, problem = ?, updated_at = ? where id = ?",
				UploadStatus.State.FAILED.name(), this.json.writeValueAsString(problem), now(), id);
	}

	/**
	 * Marks jobs that were running when a server stopped as failed. Their batch rows were
	 * never committed, so nothing else is left to clean.
	 * @return the number of jobs marked
	 */
	int failInterrupted() {
		return this.jdbc.update(
				"update upload_job set state = ?, problem = ?, updated_at = ? where state in ('QUEUED', 'RUNNING')",
				UploadStatus.State.FAILED.name(),
				"{\"title\":\"Upload interrupted\",\"status\":503,"
						+ "\"detail\":\"The server stopped during the upload; nothing of the batch was stored."
						+ " Upload the file again.\"}",
				now());
	}

	Optional<UploadStatus> find(UUID id) {
		return this.jdbc
			.query("select id, created_by, state, stage, bytes_total, drafts_parsed, cells_made, batch_id,"
					+ " problem, created_at, updated_at from upload_job where id = ?", this::map, id)
			.stream()
			.findFirst();
	}

	private UploadStatus map(ResultSet rs, int row) throws SQLException {
		String problem = rs.getString(9);
		Number batchId = (Number) rs.getObject(8);
		Map<String, Object> problemBody = (problem != null)
				? this.json.readValue(problem, new TypeReference<Map<String, Object>>() {
				}) : null;
		return new UploadStatus(rs.getObject(1, UUID.class), rs.getLong(2), UploadStatus.State.valueOf(rs.getString(3)),
				rs.getString(4), rs.getLong(5), rs.getLong(6), rs.getInt(7),
				(batchId != null) ? batchId.longValue() : null, problemBody,
				rs.getObject(10, OffsetDateTime.class).toInstant(), rs.getObject(11, OffsetDateTime.class).toInstant());
	}

	private static OffsetDateTime now() {
		return OffsetDateTime.now(ZoneOffset.UTC);
	}

}
