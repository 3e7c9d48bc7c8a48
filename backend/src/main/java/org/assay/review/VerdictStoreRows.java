package org.assay.review;

import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.OffsetDateTime;
import java.util.UUID;

import org.assay.geo.Wkb;

/**
 * Reads a verdict from the twelve columns that the verdict queries select, in their
 * order: id, draft, cell, batch, validator id and name, verdict, reason, comment,
 * geometry, supersedes, time.
 */
final class VerdictStoreRows {

	private VerdictStoreRows() {
	}

	static VerdictRecord map(ResultSet rs, int n) throws SQLException {
		return mapFrom(rs, 1);
	}

	static VerdictRecord mapFrom(ResultSet rs, int first) throws SQLException {
		int c = first;
		byte[] geometry = rs.getBytes(c + 9);
		return new VerdictRecord(rs.getObject(c, UUID.class), rs.getLong(c + 1), rs.getLong(c + 2), rs.getLong(c + 3),
				rs.getLong(c + 4), rs.getString(c + 5), Verdict.valueOf(rs.getString(c + 6)), rs.getString(c + 7),
				rs.getString(c + 8), (geometry != null) ? Wkb.read(geometry) : null, rs.getObject(c + 10, UUID.class),
				rs.getObject(c + 11, OffsetDateTime.class).toInstant());
	}

}
