package org.assay.export.training;

import java.io.ByteArrayOutputStream;
import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.util.zip.CRC32;
import java.util.zip.Deflater;

/**
 * Encodes an 8-bit greyscale image as PNG (ISO/IEC 15948, W3C PNG specification): the
 * signature, IHDR (bit depth 8, colour type 0, no interlace), one IDAT of zlib-deflated
 * rows each with filter type 0 (none), and IEND. Label masks are runs of 0 and 255 that
 * deflate well unfiltered (the Sub filter made the benchmark's set a third larger); the
 * JDK's writer spends most of its time choosing among the five row filters, several times
 * this encoder's cost per tile (ExportBenchmark).
 */
final class GreyPng {

	private static final byte[] SIGNATURE = { (byte) 137, 80, 78, 71, 13, 10, 26, 10 };

	/**
	 * One deflater per thread, reset for each image: making one costs more than deflating
	 * a mask. Its native memory (some 256 KiB at this level) stays with the thread.
	 */
	private static final ThreadLocal<Deflater> DEFLATER = ThreadLocal
		.withInitial(() -> new Deflater(Deflater.BEST_SPEED));

	private GreyPng() {
	}

	/**
	 * @param pixels row by row from the top, one byte per pixel
	 * @param width pixels per row
	 * @param height rows
	 * @return the PNG file
	 */
	static byte[] encode(byte[] pixels, int width, int height) {
		if (pixels.length != width * height) {
			throw new IllegalArgumentException("expected " + width * height + " pixels, not " + pixels.length);
		}
		byte[] raw = new byte[(width + 1) * height];
		for (int row = 0; row < height; row++) {
			// raw[row * (width + 1)] stays 0: filter type none
			System.arraycopy(pixels, row * width, raw, row * (width + 1) + 1, width);
		}
		Deflater deflater = DEFLATER.get();
		deflater.reset();
		deflater.setInput(raw);
		deflater.finish();
		ByteArrayOutputStream compressed = new ByteArrayOutputStream(raw.length / 8 + 64);
		byte[] buffer = new byte[8192];
		while (!deflater.finished()) {
			compressed.write(buffer, 0, deflater.deflate(buffer));
		}
		byte[] data = compressed.toByteArray();

		ByteArrayOutputStream out = new ByteArrayOutputStream(data.length + 64);
		out.writeBytes(SIGNATURE);
		ByteBuffer header = ByteBuffer.allocate(13);
		header.putInt(width).putInt(height);
		header.put((byte) 8); // bit depth
		header.put((byte) 0); // colour type: greyscale
		header.put((byte) 0); // compression: deflate
		header.put((byte) 0); // filter method 0
		header.put((byte) 0); // no interlace
		chunk(out, "IHDR", header.array());
		chunk(out, "IDAT", data);
		chunk(out, "IEND", new byte[0]);
		return out.toByteArray();
	}

	private static void chunk(ByteArrayOutputStream out, String type, byte[] data) {
		byte[] name = type.getBytes(StandardCharsets.US_ASCII);
		CRC32 crc = new CRC32();
		crc.update(name);
		crc.update(data);
		out.writeBytes(ByteBuffer.allocate(4).putInt(data.length).array());
		out.writeBytes(name);
		out.writeBytes(data);
		out.writeBytes(ByteBuffer.allocate(4).putInt((int) crc.getValue()).array());
	}

}
