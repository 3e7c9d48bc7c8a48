package org.assay.reports;

import java.util.List;
import java.util.Locale;

/**
 * Writes CSV as RFC 4180 describes it: comma-separated, CRLF line ends, fields with a
 * comma, a quote or a line break quoted and their quotes doubled; numbers with a point.
 */
final class Csv {

	private final StringBuilder out = new StringBuilder();

	Csv row(Object... fields) {
		return row(List.of(fields));
	}

	Csv row(List<?> fields) {
		for (int i = 0; i < fields.size(); i++) {
			if (i > 0) {
				this.out.append(',');
			}
			this.out.append(field(fields.get(i)));
		}
		this.out.append("\r\n");
		return this;
	}

	@Override
	public String toString() {
		return this.out.toString();
	}

	private static String field(Object value) {
		if (value == null) {
			return "";
		}
		if (value instanceof Double number) {
			return Double.isFinite(number) ? String.format(Locale.ROOT, "%.6f", number) : "";
		}
		String text = String.valueOf(value);
		if (text.indexOf(',') >= 0 || text.indexOf('"') >= 0 || text.indexOf('\n') >= 0 || text.indexOf('\r') >= 0) {
			return '"' + text.replace("\"", "\"\"") + '"';
		}
		return text;
	}

}
