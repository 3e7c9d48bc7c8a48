package org.assay.geo;

import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;

/**
 * A byte buffer that keeps at most its limit and remembers whether more came, so that an
 * oversized properties object costs no more memory than the limit. Reused from feature to
 * feature.
 */
final class BoundedBytes extends OutputStream {

	private final int limit;

	private byte[] bytes = new byte[1024];

	private long count;

	BoundedBytes(int limit) {
		this.limit = limit;
	}

	int limit() {
		return this.limit;
	}

	void reset() {
		this.count = 0;
	}

	boolean overflowed() {
		return this.count > this.limit;
	}

	/** The bytes kept, as UTF-8 text; meaningful only when nothing overflowed. */
	String text() {
		return new String(this.bytes, 0, (int) Math.min(this.count, this.limit), StandardCharsets.UTF_8);
	}

	@Override
	public void write(int b) {
		write(new byte[] { (byte) b }, 0, 1);
	}

	@Override
	public void write(byte[] source, int offset, int length) {
		long end = this.count + length;
		if (end <= this.limit) {
			if (end > this.bytes.length) {
				this.bytes = Arrays.copyOf(this.bytes,
						(int) Math.min(this.limit, Math.max(end, this.bytes.length * 2L)));
			}
			System.arraycopy(source, offset, this.bytes, (int) this.count, length);
		}
		this.count = end;
	}

}
