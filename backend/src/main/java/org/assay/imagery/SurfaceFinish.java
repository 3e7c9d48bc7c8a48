package org.assay.imagery;

import java.awt.image.BufferedImage;

/**
 * The per-pixel finish of a tile: a mottled brightness over the land (two octaves of
 * value noise at 20 m and 5 m, anchored to the projected world), tree canopy wherever the
 * woods mask is set (crowns of about four metres, dark green, covering whatever was drawn
 * beneath), and a faint grain everywhere, seeded by the pixel's place in the whole zoom
 * level.
 */
final class SurfaceFinish {

	private final TileFrame frame;

	SurfaceFinish(TileFrame frame) {
		this.frame = frame;
	}

	/**
	 * Fills the land with meadow of slowly varying tone, green to dry ochre, in patches
	 * of a hundred metres or so, wherever no field is drawn over it later.
	 */
	void ground(BufferedImage image, BufferedImage land) {
		for (int row = 0; row < 256; row++) {
			double northing = this.frame.northingOf(row);
			for (int column = 0; column < 256; column++) {
				double share = land.getRaster().getSample(column, row, 0) / 255.0;
				if (share == 0) {
					continue;
				}
				double easting = this.frame.eastingOf(column);
				double dry = Noise.value(easting / 180, northing / 180, 5);
				double lush = Noise.value(easting / 60, northing / 60, 6);
				dry = dry * dry * (3 - 2 * dry);
				int rgb = image.getRGB(column, row);
				int r = meadow(Palette.MEADOW.getRed(), Palette.DRY.getRed(), Palette.LUSH.getRed(), dry, lush);
				int g = meadow(Palette.MEADOW.getGreen(), Palette.DRY.getGreen(), Palette.LUSH.getGreen(), dry, lush);
				int b = meadow(Palette.MEADOW.getBlue(), Palette.DRY.getBlue(), Palette.LUSH.getBlue(), dry, lush);
				image.setRGB(column, row, (mix((rgb >> 16) & 0xFF, r, share) << 16)
						| (mix((rgb >> 8) & 0xFF, g, share) << 8) | mix(rgb & 0xFF, b, share));
			}
		}
	}

	private static int meadow(int meadow, int dry, int lush, double dryness, double lushness) {
		double value = meadow + (dry - meadow) * dryness;
		return (int) Math.round(value + (lush - value) * 0.45 * lushness);
	}

	private static int mix(int from, int to, double share) {
		return (int) Math.round(from + (to - from) * share);
	}

	void apply(BufferedImage image, BufferedImage land, BufferedImage woods) {
		long originX = (long) this.frame.tile.x() * 256;
		long originY = (long) this.frame.tile.y() * 256;
		int z = this.frame.tile.z();
		for (int row = 0; row < 256; row++) {
			double northing = this.frame.northingOf(row);
			for (int column = 0; column < 256; column++) {
				double easting = this.frame.eastingOf(column);
				int rgb = image.getRGB(column, row);
				double r = (rgb >> 16) & 0xFF;
				double g = (rgb >> 8) & 0xFF;
				double b = rgb & 0xFF;
				double landShare = (land.getRaster().getSample(column, row, 0)) / 255.0;
				if (landShare > 0) {
					double mottle = 0.93 + 0.10 * Noise.value(easting / 20, northing / 20, 1)
							+ 0.05 * Noise.value(easting / 5, northing / 5, 2);
					double factor = 1 + landShare * (mottle - 1);
					r *= factor;
					g *= factor;
					b *= factor;
				}
				double woodsShare = (woods.getRaster().getSample(column, row, 0)) / 255.0;
				if (woodsShare > 0) {
					double crowns = Noise.crowns(easting / 4.5, northing / 4.5, 3);
					double shade = 0.5 + 0.5 * crowns + 0.4 * Noise.value(easting / 25, northing / 25, 4);
					r += woodsShare * (Palette.CANOPY.getRed() * shade - r);
					g += woodsShare * (Palette.CANOPY.getGreen() * shade - g);
					b += woodsShare * (Palette.CANOPY.getBlue() * shade - b);
				}
				double grain = (Noise.hash(originX + column, originY + row, z) - 0.5) * 6;
				image.setRGB(column, row,
						(Palette.clamp((int) Math.round(r + grain)) << 16)
								| (Palette.clamp((int) Math.round(g + grain)) << 8)
								| Palette.clamp((int) Math.round(b + grain)));
			}
		}
	}

}
