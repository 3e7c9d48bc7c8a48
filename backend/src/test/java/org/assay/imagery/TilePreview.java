package org.assay.imagery;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.assay.demo.DemoWorld;
import org.assay.demo.DemoWorld.HiddenStretch;
import org.assay.geo.WebMercatorQuad;
import org.assay.geo.WebMercatorQuad.Tile;

/**
 * Writes a few tiles (and 3 x 3 mosaics of them) to a folder for a person to look at:
 * over the first village and over the first hidden road stretch, at zoom 14, 16 and 18.
 * Not a test; run it by hand with the folder as its argument.
 */
final class TilePreview {

	private TilePreview() {
	}

	public static void main(String[] args) throws IOException {
		Path out = Path.of((args.length > 0) ? args[0] : "/tmp/assay-imagery-preview");
		Files.createDirectories(out);
		DemoWorld world = DemoWorldHolder.get();
		DemoTileRenderer renderer = new DemoTileRenderer(world);
		HiddenStretch hidden = world.hiddenStretches().get(0);
		double[][] places = { { world.villages().get(0).centre().getX(), world.villages().get(0).centre().getY() },
				{ hidden.geometry().getCentroid().getX(), hidden.geometry().getCentroid().getY() } };
		String[] names = { "village", "woods" };
		for (int p = 0; p < places.length; p++) {
			for (int z : new int[] { 14, 16, 18 }) {
				Tile centre = WebMercatorQuad.tileAt(places[p][0], places[p][1], z);
				java.awt.image.BufferedImage mosaic = new java.awt.image.BufferedImage(768, 768,
						java.awt.image.BufferedImage.TYPE_INT_RGB);
				java.awt.Graphics2D g = mosaic.createGraphics();
				for (int dx = -1; dx <= 1; dx++) {
					for (int dy = -1; dy <= 1; dy++) {
						Tile tile = new Tile(z, centre.x() + dx, centre.y() + dy);
						g.drawImage(renderer.render(tile), (dx + 1) * 256, (dy + 1) * 256, null);
					}
				}
				g.dispose();
				Files.write(out.resolve(names[p] + "-z" + z + ".png"), DemoImagery.png(mosaic));
			}
		}
		System.out.println("Hidden stretch " + hidden.roadId() + " " + hidden.geometry());
	}

}
