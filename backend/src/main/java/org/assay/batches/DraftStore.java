package org.assay.batches;

import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.List;
import java.util.Optional;

import org.assay.geo.FeatureKind;
import org.assay.geo.Wkb;

import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.stereotype.Service;

/**
 * Reads stored drafts and reference features. Drafts are written only by the upload job.
 */
@Service
public class DraftStore {

	private static final String DRAFT = "select id, batch_id, cell_id, seq, source_id, kind, confidence, feature_class,"
			+ " geom, properties, risk, flags from draft";

	private final JdbcTemplate jdbc;

	DraftStore(JdbcTemplate jdbc) {
		this.jdbc = jdbc;
	}

	/**
	 * The drafts of a cell in file order.
	 * @param cellId the cell
	 * @return its drafts
	 */
	public List<Draft> inCell(long cellId) {
		return this.jdbc.query(DRAFT + " where cell_id = ? order by seq", DraftStore::draft, cellId);
	}

	/**
	 * A draft by id.
	 * @param id the draft id
	 * @return the draft, if any
	 */
	public Optional<Draft> find(long id) {
		return this.jdbc.query(DRAFT + " where id = ?", DraftStore::draft, id).stream().findFirst();
	}

	/**
	 * The reference features of a batch whose boxes meet a box.
	 * @param batchId the batch
	 * @param west west edge
	 * @param south south edge
	 * @param east east edge
	 * @param north north edge
	 * @param limit the most features to return
	 * @return the features
	 */
	public List<ReferenceFeature> referenceWithin(long batchId, double west, double south, double east, double north,
			int limit) {
		return this.jdbc.query((connection) -> {
			var ps = connection.prepareStatement("select id, source_id, kind, geom from reference_feature"
					+ " where batch_id = ? and min_x <= ? and max_x >= ? and min_y <= ? and max_y >= ? order by id");
			ps.setLong(1, batchId);
			ps.setDouble(2, east);
			ps.setDouble(3, west);
			ps.setDouble(4, north);
			ps.setDouble(5, south);
			ps.setMaxRows(limit);
			return ps;
		}, (rs, row) -> new ReferenceFeature(rs.getLong(1), rs.getString(2), FeatureKind.fromJson(rs.getString(3)),
				Wkb.read(rs.getBytes(4))));
	}

	private static Draft draft(ResultSet rs, int row) throws SQLException {
		return new Draft(rs.getLong(1), rs.getLong(2), rs.getLong(3), rs.getInt(4), rs.getString(5),
				FeatureKind.fromJson(rs.getString(6)), rs.getDouble(7), rs.getString(8), Wkb.read(rs.getBytes(9)),
				rs.getString(10), rs.getDouble(11), rs.getString(12));
	}

}
