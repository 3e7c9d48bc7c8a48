package org.assay.geo;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Shows that {@link GeoJsonFeatureReader} streams: about 200 MB of drafts, generated as
 * they are read, pass through a JVM whose heap is limited to 64 MB. A reader that built a
 * tree of the document, or kept the features, would run out of memory.
 */
@Tag("streaming")
class GeoJsonStreamingTests {

	// about 555 bytes a draft (GeneratedDrafts), so about 200 MB
	private static final long DRAFTS = 360_000;

	@Test
	void twoHundredMegabytesStreamThroughA64MegabyteHeap() throws Exception {
		String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
		Process process = new ProcessBuilder(List.of(java, "-Xmx64m", "-cp", System.getProperty("java.class.path"),
				StreamingProbe.class.getName(), Long.toString(DRAFTS)))
			.redirectErrorStream(true)
			.start();
		String output = readAll(process.getInputStream());
		boolean ended = process.waitFor(60, TimeUnit.SECONDS);
		assertThat(ended).as("the probe ended in time").isTrue();
		assertThat(process.exitValue()).as(output).isZero();
		assertThat(output).contains("features=" + DRAFTS);
	}

	@Test
	void generatedDraftsAreAboutTheSizeOfTheStudiedOnes() throws IOException {
		// PERFORMANCE-NOTES.md: 555 MB and 17.7M coordinates for a million drafts
		long bytes = 0;
		try (InputStream in = new GeneratedDrafts(10_000, 7)) {
			bytes = in.transferTo(OutputStreamCounter.INSTANCE);
		}
		assertThat(bytes / 10_000.0).isBetween(500.0, 610.0);
	}

	private static String readAll(InputStream in) throws IOException {
		ByteArrayOutputStream out = new ByteArrayOutputStream();
		in.transferTo(out);
		return out.toString(StandardCharsets.UTF_8);
	}

	/** Discards what it is given; transferTo counts for us. */
	private static final class OutputStreamCounter extends java.io.OutputStream {

		static final OutputStreamCounter INSTANCE = new OutputStreamCounter();

		@Override
		public void write(int b) {
		}

		@Override
		public void write(byte[] b, int off, int len) {
		}

	}

}
