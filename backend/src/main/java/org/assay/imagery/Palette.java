package org.assay.imagery;

import java.awt.Color;

/**
 * The colours of the synthetic imagery: muted, as seen from above in summer. Fields and
 * roofs pick one of a few tones by a hash of their world id, so neighbours differ and a
 * feature keeps its colour from tile to tile and zoom to zoom.
 */
final class Palette {

	static final Color SEA = new Color(96, 122, 138);

	static final Color BEACH = new Color(196, 186, 150);

	static final Color MEADOW = new Color(118, 134, 84);

	static final Color DRY = new Color(150, 142, 94);

	static final Color LUSH = new Color(96, 118, 70);

	static final Color MAIN_EDGE = new Color(104, 104, 100);

	static final Color MAIN = new Color(146, 146, 142);

	static final Color MAIN_MARKING = new Color(222, 222, 212);

	static final Color STREET_EDGE = new Color(150, 146, 140);

	static final Color STREET = new Color(186, 182, 174);

	static final Color TRACK = new Color(178, 152, 110);

	static final Color TRACK_GRASS = new Color(128, 130, 86, 150);

	static final Color SHADOW = new Color(36, 38, 30, 120);

	static final Color ORCHARD_TREE = new Color(66, 92, 52);

	static final Color CANOPY = new Color(46, 72, 40);

	private static final Color[] CROP = { new Color(170, 152, 90), new Color(152, 156, 88), new Color(178, 162, 106),
			new Color(160, 142, 84) };

	private static final Color[] PASTURE = { new Color(112, 136, 78), new Color(122, 146, 86),
			new Color(102, 126, 72) };

	private static final Color[] FALLOW = { new Color(140, 116, 84), new Color(152, 128, 94), new Color(130, 110, 80) };

	private static final Color[] ORCHARD = { new Color(108, 128, 76), new Color(118, 134, 82) };

	private static final Color[] HOUSE_ROOF = { new Color(158, 82, 64), new Color(140, 76, 60), new Color(170, 98, 74),
			new Color(124, 114, 110) };

	private static final Color[] BARN_ROOF = { new Color(132, 136, 138), new Color(116, 122, 120),
			new Color(150, 146, 136) };

	private Palette() {
	}

	static Color field(String cover, String id) {
		Color[] tones = switch (cover) {
			case "crop" -> CROP;
			case "fallow" -> FALLOW;
			case "orchard" -> ORCHARD;
			default -> PASTURE;
		};
		return jitter(pick(tones, id), id, 8);
	}

	static Color roof(String buildingClass, String id) {
		return jitter(pick("barn".equals(buildingClass) ? BARN_ROOF : HOUSE_ROOF, id), id, 6);
	}

	static Color darker(Color colour, double factor) {
		return new Color((int) (colour.getRed() * factor), (int) (colour.getGreen() * factor),
				(int) (colour.getBlue() * factor), colour.getAlpha());
	}

	private static Color pick(Color[] tones, String id) {
		return tones[(int) (Noise.hash(id.hashCode(), 7, 0) * tones.length)];
	}

	private static Color jitter(Color colour, String id, int amount) {
		int delta = (int) Math.round((Noise.hash(id.hashCode(), 11, 0) - 0.5) * 2 * amount);
		return new Color(clamp(colour.getRed() + delta), clamp(colour.getGreen() + delta),
				clamp(colour.getBlue() + delta));
	}

	static int clamp(int value) {
		return Math.max(0, Math.min(255, value));
	}

}
