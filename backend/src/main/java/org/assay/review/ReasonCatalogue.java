package org.assay.review;

import java.util.List;

import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.stereotype.Service;

/**
 * Reads reason catalogues.
 */
@Service
public class ReasonCatalogue {

	private final JdbcTemplate jdbc;

	ReasonCatalogue(JdbcTemplate jdbc) {
		this.jdbc = jdbc;
	}

	/**
	 * The reasons of a catalogue, retired ones included, in verdict and position order.
	 * @param catalogue the catalogue's name
	 * @return its reasons
	 */
	public List<ReasonCode> reasons(String catalogue) {
		return this.jdbc.query(
				"select verdict, code, label, description, shortcut, is_default, retired"
						+ " from reason_code where catalogue = ? order by verdict, position",
				(rs, n) -> new ReasonCode(Verdict.valueOf(rs.getString(1)), rs.getString(2), rs.getString(3),
						rs.getString(4), rs.getString(5), rs.getBoolean(6), rs.getBoolean(7)),
				catalogue);
	}

}
