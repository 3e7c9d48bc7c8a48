package org.assay.imagery;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.function.Supplier;

import org.assay.geo.WebMercatorQuad.Tile;

/**
 * Rendered tiles on disk, at {@code <root>/r<version>/<z>/<x>/<y>.png}, so that a new
 * renderer version never serves an old drawing. A tile is written to a temporary file and
 * moved into place, so a reader never sees half a tile; two requests for a missing tile
 * may both draw it, which is harmless since drawing is deterministic.
 */
final class TileCache {

	private final Path versionRoot;

	TileCache(Path root, int version) {
		this.versionRoot = root.resolve("r" + version);
	}

	Path file(Tile tile) {
		return this.versionRoot.resolve(Integer.toString(tile.z()))
			.resolve(Integer.toString(tile.x()))
			.resolve(tile.y() + ".png");
	}

	/**
	 * The tile's bytes from disk, or drawn and stored.
	 * @param tile the tile
	 * @param draw draws the tile's PNG when it is not on disk
	 * @return the PNG bytes
	 */
	byte[] get(Tile tile, Supplier<byte[]> draw) {
		Path file = file(tile);
		try {
			if (Files.isRegularFile(file)) {
				return Files.readAllBytes(file);
			}
			byte[] png = draw.get();
			Files.createDirectories(file.getParent());
			Path temporary = Files.createTempFile(file.getParent(), "tile-", ".part");
			Files.write(temporary, png);
			try {
				Files.move(temporary, file, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
			}
			catch (AtomicMoveNotSupportedException ex) {
				Files.move(temporary, file, StandardCopyOption.REPLACE_EXISTING);
			}
			return png;
		}
		catch (IOException ex) {
			throw new UncheckedIOException(ex);
		}
	}

}
