package org.assay.export.training;

import java.awt.image.BufferedImage;
import java.awt.image.DataBufferByte;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.Arrays;

import javax.imageio.ImageIO;

import org.assay.geo.WebMercatorQuad;
import org.assay.geo.WebMercatorQuad.Tile;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Lineal;
import org.locationtech.jts.geom.Polygonal;
import org.locationtech.jts.operation.buffer.BufferOp;
import org.locationtech.jts.operation.buffer.BufferParameters;

/**
 * A label mask of one WebMercatorQuad tile: 256 x 256 pixels, each 0 (nothing) or 255
 * (the labelled geometry), written as a single-band 8-bit greyscale PNG.
 *
 * <p>
 * A road is buffered to its width in ground metres (half the width on each side, round
 * caps and joins) and an area is taken as it is; a pixel is marked when its centre lies
 * inside, by the even-odd rule, so holes stay unmarked. This is the usual "pixel centre"
 * rule of polygon rasterisers (common practice): a band of width {@code w} pixels across
 * the tile marks {@code round(w)} rows, give or take one where its edges meet pixel
 * centres.
 *
 * <pre>
 * TileMask mask = new TileMask(WebMercatorQuad.tileAt(lon, lat, 18));
 * mask.addRoad(line, 6.0);
 * byte[] png = mask.png();
 * </pre>
 */
final class TileMask {

	static final int SIZE = WebMercatorQuad.TILE_SIZE;

	private static final int QUADRANT_SEGMENTS = 8;

	private final TilePixels frame;

	private final byte[] pixels = new byte[SIZE * SIZE];

	private int marked;

	TileMask(Tile tile) {
		this.frame = new TilePixels(tile);
	}

	Tile tile() {
		return this.frame.tile();
	}

	/**
	 * Marks a road: a lineal geometry in longitude/latitude, buffered to a width.
	 * @param lonLat LineString or MultiLineString
	 * @param widthMetres the road's width on the ground, more than 0
	 * @return the number of pixels the road covers in this tile, marked before or not
	 */
	int addRoad(Geometry lonLat, double widthMetres) {
		if (!(lonLat instanceof Lineal)) {
			throw new IllegalArgumentException("a road is a LineString or MultiLineString");
		}
		if (!(widthMetres > 0)) {
			throw new IllegalArgumentException("the road width must be more than 0 m");
		}
		double half = widthMetres / 2 / this.frame.metresPerPixel();
		Geometry line = clip(this.frame.toPixels(lonLat), half + 2);
		if (line.isEmpty()) {
			return 0;
		}
		BufferParameters parameters = new BufferParameters(QUADRANT_SEGMENTS);
		return fill(BufferOp.bufferOp(line, half, parameters));
	}

	/**
	 * Marks an area: a polygonal geometry in longitude/latitude.
	 * @param lonLat Polygon or MultiPolygon
	 * @return the number of pixels the area covers in this tile, marked before or not
	 */
	int addArea(Geometry lonLat) {
		if (!(lonLat instanceof Polygonal)) {
			throw new IllegalArgumentException("an area is a Polygon or MultiPolygon");
		}
		return fill(this.frame.toPixels(lonLat));
	}

	/** The number of marked pixels. */
	int count() {
		return this.marked;
	}

	/** Whether a pixel is marked. */
	boolean isMarked(int col, int row) {
		return this.pixels[row * SIZE + col] != 0;
	}

	/**
	 * The mask as a PNG: one 8-bit grey band, 0 or 255.
	 * @return the PNG file's bytes
	 */
	byte[] png() {
		BufferedImage image = new BufferedImage(SIZE, SIZE, BufferedImage.TYPE_BYTE_GRAY);
		byte[] raster = ((DataBufferByte) image.getRaster().getDataBuffer()).getData();
		System.arraycopy(this.pixels, 0, raster, 0, raster.length);
		ByteArrayOutputStream out = new ByteArrayOutputStream(1024);
		try {
			ImageIO.write(image, "png", out);
		}
		catch (IOException ex) {
			throw new UncheckedIOException(ex);
		}
		return out.toByteArray();
	}

	/**
	 * Cuts a pixel-space geometry to the tile and a margin, so that buffers stay small.
	 */
	private static Geometry clip(Geometry pixels, double margin) {
		Envelope box = new Envelope(-margin, SIZE + margin, -margin, SIZE + margin);
		if (box.contains(pixels.getEnvelopeInternal())) {
			return pixels;
		}
		return pixels.intersection(pixels.getFactory().toGeometry(box));
	}

	private int fill(Geometry area) {
		Envelope box = area.getEnvelopeInternal();
		if (area.isEmpty() || box.getMaxX() < 0 || box.getMaxY() < 0 || box.getMinX() > SIZE || box.getMinY() > SIZE) {
			return 0;
		}
		int covered = 0;
		EdgeList edges = EdgeList.of(area);
		int firstRow = Math.max(0, (int) Math.floor(box.getMinY() - 0.5));
		int lastRow = Math.min(SIZE - 1, (int) Math.ceil(box.getMaxY()));
		double[] crossings = new double[16];
		for (int row = firstRow; row <= lastRow; row++) {
			double y = row + 0.5;
			int n = edges.crossings(y, crossings);
			if (n > crossings.length) {
				crossings = new double[n];
				edges.crossings(y, crossings);
			}
			Arrays.sort(crossings, 0, n);
			for (int k = 0; k + 1 < n; k += 2) {
				covered += markSpan(row, crossings[k], crossings[k + 1]);
			}
		}
		return covered;
	}

	/**
	 * Marks the pixels of a row whose centres lie in {@code [from, to)}.
	 * @return how many pixels the span covers
	 */
	private int markSpan(int row, double from, double to) {
		int first = Math.max(0, (int) Math.ceil(from - 0.5));
		int last = Math.min(SIZE - 1, (int) Math.ceil(to - 0.5) - 1);
		for (int col = first; col <= last; col++) {
			int at = row * SIZE + col;
			if (this.pixels[at] == 0) {
				this.pixels[at] = (byte) 255;
				this.marked++;
			}
		}
		return Math.max(0, last - first + 1);
	}

}
