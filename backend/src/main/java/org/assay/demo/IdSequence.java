package org.assay.demo;

import java.util.Locale;

/**
 * Numbers things in the order they are made: {@code road-0001}, {@code road-0002}, ...
 */
final class IdSequence {

	private final String format;

	private int last;

	IdSequence(String format) {
		this.format = format;
	}

	String next() {
		this.last++;
		return String.format(Locale.ROOT, this.format, this.last);
	}

}
