package org.assay.imagery;

import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.Optional;
import java.util.function.Supplier;

import javax.imageio.ImageIO;

import org.assay.demo.DemoScenario;
import org.assay.demo.DemoWorld;
import org.assay.geo.WebMercatorQuad;
import org.assay.geo.WebMercatorQuad.Tile;

/**
 * The demo island's imagery tiles as PNG bytes: drawn from the true world on first
 * request and cached on disk. Tiles that show no land share one sea tile held in memory,
 * so that no crawl of the open ocean can fill the disk.
 */
final class DemoImagery {

	/** The lowest zoom served. */
	static final int MIN_ZOOM = 12;

	/** The highest zoom served. */
	static final int MAX_ZOOM = 19;

	private final Supplier<DemoWorld> world;

	private final TileCache cache;

	private volatile DemoTileRenderer renderer;

	private volatile byte[] sea;

	/**
	 * Imagery of a world.
	 * @param world supplies the true world, called once on the first request
	 * @param cacheRoot where tiles are stored
	 */
	DemoImagery(Supplier<DemoWorld> world, Path cacheRoot) {
		this.world = world;
		this.cache = new TileCache(cacheRoot, DemoTileRenderer.VERSION);
	}

	/**
	 * Imagery of the default demo scenario.
	 * @param cacheRoot where tiles are stored
	 * @return the imagery, generating the scenario on first request
	 */
	static DemoImagery ofDefaultScenario(Path cacheRoot) {
		return new DemoImagery(() -> DemoScenario.generate().world(), cacheRoot);
	}

	/**
	 * A tile as PNG.
	 * @param z the zoom
	 * @param x the column
	 * @param y the row
	 * @return the PNG bytes, or empty outside zoom 12 to 19 or the tile matrix
	 */
	Optional<byte[]> tile(int z, long x, long y) {
		if (z < MIN_ZOOM || z > MAX_ZOOM || !WebMercatorQuad.contains(z, x, y)) {
			return Optional.empty();
		}
		Tile tile = new Tile(z, (int) x, (int) y);
		DemoTileRenderer renderer = renderer();
		if (!renderer.showsLand(tile)) {
			return Optional.of(sea(renderer, tile));
		}
		return Optional.of(this.cache.get(tile, () -> png(renderer.render(tile))));
	}

	private byte[] sea(DemoTileRenderer renderer, Tile tile) {
		byte[] bytes = this.sea;
		if (bytes == null) {
			bytes = png(renderer.render(tile));
			this.sea = bytes;
		}
		return bytes;
	}

	private DemoTileRenderer renderer() {
		DemoTileRenderer current = this.renderer;
		if (current == null) {
			synchronized (this) {
				current = this.renderer;
				if (current == null) {
					current = new DemoTileRenderer(this.world.get());
					this.renderer = current;
				}
			}
		}
		return current;
	}

	static byte[] png(BufferedImage image) {
		ByteArrayOutputStream out = new ByteArrayOutputStream(64 * 1024);
		try {
			ImageIO.write(image, "png", out);
		}
		catch (IOException ex) {
			throw new UncheckedIOException(ex);
		}
		return out.toByteArray();
	}

}
