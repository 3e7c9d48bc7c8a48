package org.assay.geo;

import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import java.util.SplittableRandom;

/**
 * A FeatureCollection of road drafts made up on the fly as it is read, so that tests and
 * benchmarks can stream hundreds of megabytes without a file. The drafts look like a
 * model's output: about 17.7 positions of wandering line with six decimals, an id, a
 * confidence, a class, a tile; about 555 bytes each, as in the study of
 * PERFORMANCE-NOTES.md (555 MB and 17.7M coordinates for a million drafts). The same seed
 * gives the same bytes.
 */
public final class GeneratedDrafts extends InputStream {

	private static final byte[] HEADER = bytes(
			"{\"type\":\"FeatureCollection\",\"name\":\"generated drafts\",\"features\":[\n");

	private static final byte[] FOOTER = bytes("\n]}\n");

	private static final String[] CLASSES = { "residential", "service", "track", "unclassified", "tertiary" };

	private final long count;

	private final SplittableRandom random;

	private byte[] chunk = HEADER;

	private int chunkLength = HEADER.length;

	private int at;

	private long made;

	private boolean ended;

	private final Text text = new Text();

	/**
	 * Makes a collection.
	 * @param count the number of drafts
	 * @param seed the seed of the made-up shapes and properties
	 */
	public GeneratedDrafts(long count, long seed) {
		this.count = count;
		this.random = new SplittableRandom(seed);
	}

	@Override
	public int read() {
		byte[] one = new byte[1];
		return (read(one, 0, 1) < 0) ? -1 : one[0] & 0xff;
	}

	@Override
	public int read(byte[] target, int offset, int length) {
		if (length == 0) {
			return 0;
		}
		while (this.at == this.chunkLength) {
			if (!refill()) {
				return -1;
			}
		}
		int n = Math.min(length, this.chunkLength - this.at);
		System.arraycopy(this.chunk, this.at, target, offset, n);
		this.at += n;
		return n;
	}

	private boolean refill() {
		this.at = 0;
		if (this.made < this.count) {
			this.text.clear();
			if (this.made > 0) {
				this.text.append(",\n");
			}
			draft(this.made++);
			this.chunk = this.text.bytes;
			this.chunkLength = this.text.length;
			return true;
		}
		if (!this.ended) {
			this.ended = true;
			this.chunk = FOOTER;
			this.chunkLength = FOOTER.length;
			return true;
		}
		return false;
	}

	private void draft(long index) {
		Text out = this.text;
		out.append("{\"type\":\"Feature\",\"id\":\"d-").number(index).append("\",");
		out.append("\"geometry\":{\"type\":\"LineString\",\"coordinates\":[");
		// 12..23 positions, one more in five drafts: 17.7 on average
		int positions = 12 + this.random.nextInt(12) + ((this.random.nextInt(5) == 0) ? 1 : 0);
		long x = 5_000_000 + this.random.nextLong(10_000_000);
		long y = 45_000_000 + this.random.nextLong(10_000_000);
		for (int i = 0; i < positions; i++) {
			out.append((i > 0) ? ",[" : "[").micro(x).append(",").micro(y).append("]");
			x += 150 + this.random.nextInt(300);
			y += this.random.nextInt(300) - 150;
		}
		out.append("]},\"properties\":{\"kind\":\"road\",\"confidence\":0.").number(100 + this.random.nextInt(900));
		out.append(",\"class\":\"").append(CLASSES[this.random.nextInt(CLASSES.length)]);
		out.append("\",\"tile\":\"15/")
			.number(this.random.nextInt(32768))
			.append('/')
			.number(this.random.nextInt(32768));
		out.append("\"}}");
	}

	private static byte[] bytes(String text) {
		return text.getBytes(StandardCharsets.US_ASCII);
	}

	/** An ASCII buffer with the few appends the drafts need, without formatting costs. */
	private static final class Text {

		byte[] bytes = new byte[2048];

		int length;

		void clear() {
			this.length = 0;
		}

		Text append(String s) {
			ensure(s.length());
			for (int i = 0; i < s.length(); i++) {
				this.bytes[this.length++] = (byte) s.charAt(i);
			}
			return this;
		}

		Text append(char c) {
			ensure(1);
			this.bytes[this.length++] = (byte) c;
			return this;
		}

		Text number(long value) {
			return append(Long.toString(value));
		}

		/** Writes millionths as a decimal with six places: 13401234 as 13.401234. */
		Text micro(long millionths) {
			long whole = millionths / 1_000_000;
			long fraction = Math.abs(millionths % 1_000_000);
			if (millionths < 0 && whole == 0) {
				append('-');
			}
			number(whole).append('.');
			String digits = Long.toString(fraction);
			for (int i = digits.length(); i < 6; i++) {
				append('0');
			}
			return append(digits);
		}

		private void ensure(int more) {
			if (this.length + more > this.bytes.length) {
				this.bytes = Arrays.copyOf(this.bytes, Math.max(this.bytes.length * 2, this.length + more));
			}
		}

	}

}
