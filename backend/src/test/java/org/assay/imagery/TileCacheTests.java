package org.assay.imagery;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.atomic.AtomicInteger;

import org.assay.geo.WebMercatorQuad.Tile;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The disk cache of tiles: drawn once, read from the file after that, kept apart by
 * renderer version.
 */
class TileCacheTests {

	@TempDir
	Path root;

	@Test
	void aSecondRequestReadsTheFileInsteadOfDrawing() throws IOException {
		TileCache cache = new TileCache(this.root, 7);
		Tile tile = new Tile(16, 28997, 24573);
		AtomicInteger draws = new AtomicInteger();
		assertThat(cache.get(tile, () -> drawn(draws))).containsExactly(1, 2, 3);
		Path file = this.root.resolve("r7/16/28997/24573.png");
		assertThat(file).hasBinaryContent(new byte[] { 1, 2, 3 });
		Files.write(file, new byte[] { 9 });
		assertThat(cache.get(tile, () -> drawn(draws))).containsExactly(9);
		assertThat(draws).hasValue(1);
	}

	@Test
	void anotherRendererVersionDrawsAnew() {
		Tile tile = new Tile(12, 1, 2);
		AtomicInteger draws = new AtomicInteger();
		new TileCache(this.root, 1).get(tile, () -> drawn(draws));
		new TileCache(this.root, 2).get(tile, () -> drawn(draws));
		assertThat(draws).hasValue(2);
		assertThat(this.root.resolve("r1/12/1/2.png")).exists();
		assertThat(this.root.resolve("r2/12/1/2.png")).exists();
	}

	private static byte[] drawn(AtomicInteger draws) {
		draws.incrementAndGet();
		return new byte[] { 1, 2, 3 };
	}

}
