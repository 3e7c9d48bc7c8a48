package org.assay.imagery;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.Shape;
import java.awt.geom.AffineTransform;
import java.awt.geom.Path2D;
import java.awt.image.BufferedImage;

import org.assay.demo.DemoWorld;
import org.assay.demo.DemoWorld.Building;
import org.assay.demo.DemoWorld.Road;
import org.assay.demo.DemoWorld.RoadClass;
import org.assay.demo.DemoWorld.Woods;
import org.assay.geo.WebMercatorQuad.Tile;
import org.locationtech.jts.geom.Envelope;

/**
 * Draws one 256 x 256 tile of synthetic imagery from the demo's true world, in this
 * order: sea, beach and land; fields with their rows or trees; tracks, streets and main
 * roads at their width in metres (never thinner than about a pixel); buildings' shadows
 * and roofs; the shadows of the woods; then tree cover over everything, so that a road
 * under woods cannot be seen; last a texture and a grain. Anti-aliased; deterministic,
 * since all noise is a hash of world or pixel coordinates.
 *
 * <p>
 * Limits: the sun, the roof shapes and the canopy are crude; a road is drawn where the
 * world has it and nowhere else, so a draft line over plain field has nothing under it.
 */
final class DemoTileRenderer {

	/** Raise when the drawing changes, so that cached tiles are drawn anew. */
	static final int VERSION = 2;

	/**
	 * How far beyond the tile features are picked, metres: wider than any road or shadow.
	 */
	private static final double MARGIN_METRES = 25;

	static {
		if (System.getProperty("java.awt.headless") == null) {
			System.setProperty("java.awt.headless", "true");
		}
	}

	private final WorldIndex index;

	DemoTileRenderer(DemoWorld world) {
		this.index = new WorldIndex(world);
	}

	/** Whether a tile shows any of the island; if not it is plain sea. */
	boolean showsLand(Tile tile) {
		return this.index.meetsIsland(new TileFrame(tile).searchEnvelope(MARGIN_METRES));
	}

	BufferedImage render(Tile tile) {
		TileFrame frame = new TileFrame(tile);
		Envelope search = frame.searchEnvelope(MARGIN_METRES);
		BufferedImage image = new BufferedImage(256, 256, BufferedImage.TYPE_INT_RGB);
		BufferedImage land = mask();
		BufferedImage woods = mask();
		Graphics2D g = graphics(image);
		g.setColor(Palette.SEA);
		g.fillRect(0, 0, 256, 256);
		if (this.index.meetsIsland(search)) {
			Path2D coast = frame.path(this.index.coastline);
			fillMask(land, coast);
			g.setColor(Palette.BEACH);
			g.setStroke(new BasicStroke((float) Math.max(1, frame.pixels(12)), BasicStroke.CAP_ROUND,
					BasicStroke.JOIN_ROUND));
			g.draw(coast);
			new SurfaceFinish(frame).ground(image, land);
			new FieldPainter(g, frame).paint(this.index.fields(search));
			for (RoadClass roadClass : new RoadClass[] { RoadClass.TRACK, RoadClass.STREET, RoadClass.MAIN }) {
				for (Road road : this.index.roads(search)) {
					if (road.roadClass() == roadClass) {
						drawRoad(g, frame, road);
					}
				}
			}
			for (Building building : this.index.buildings(search)) {
				drawBuilding(g, frame, building);
			}
			double treeShadow = frame.pixels(7);
			g.setColor(Palette.SHADOW);
			for (Woods patch : this.index.woods(search)) {
				Path2D outline = frame.path(patch.geometry());
				g.fill(AffineTransform.getTranslateInstance(treeShadow, treeShadow).createTransformedShape(outline));
				fillMask(woods, outline);
			}
		}
		g.dispose();
		new SurfaceFinish(frame).apply(image, land, woods);
		return image;
	}

	private static void drawRoad(Graphics2D g, TileFrame frame, Road road) {
		Path2D line = frame.path(road.geometry());
		double width = frame.pixels(road.widthMetres());
		switch (road.roadClass()) {
			case MAIN -> {
				stroke(g, line, Palette.MAIN_EDGE, Math.max(1.6, width + frame.pixels(1.2)), null);
				stroke(g, line, Palette.MAIN, Math.max(1.2, width), null);
				if (frame.groundResolution < 0.6) {
					float dash = (float) frame.pixels(3);
					stroke(g, line, Palette.MAIN_MARKING, Math.max(1, frame.pixels(0.15)),
							new float[] { dash, 2 * dash });
				}
			}
			case STREET -> {
				stroke(g, line, Palette.STREET_EDGE, Math.max(1.3, width + frame.pixels(0.6)), null);
				stroke(g, line, Palette.STREET, Math.max(1.0, width), null);
			}
			default -> {
				stroke(g, line, Palette.TRACK, Math.max(1.2, width), null);
				if (frame.groundResolution < 0.6) {
					stroke(g, line, Palette.TRACK_GRASS, width * 0.3, null);
				}
			}
		}
	}

	private static void stroke(Graphics2D g, Shape shape, Color colour, double width, float[] dash) {
		g.setColor(colour);
		g.setStroke(new BasicStroke((float) width, (dash != null) ? BasicStroke.CAP_BUTT : BasicStroke.CAP_ROUND,
				BasicStroke.JOIN_ROUND, 10f, dash, 0f));
		g.draw(shape);
	}

	private static void drawBuilding(Graphics2D g, TileFrame frame, Building building) {
		Path2D outline = frame.path(building.geometry());
		double offset = frame.pixels(1.6);
		g.setColor(Palette.SHADOW);
		g.fill(AffineTransform.getTranslateInstance(offset, offset).createTransformedShape(outline));
		Color roof = Palette.roof(building.buildingClass(), building.id());
		g.setColor(roof);
		g.fill(outline);
		g.setColor(Palette.darker(roof, 0.8));
		g.setStroke(new BasicStroke((float) Math.min(1, frame.pixels(0.4))));
		g.draw(outline);
	}

	private static BufferedImage mask() {
		return new BufferedImage(256, 256, BufferedImage.TYPE_BYTE_GRAY);
	}

	private static void fillMask(BufferedImage mask, Shape shape) {
		Graphics2D g = graphics(mask);
		g.setColor(Color.WHITE);
		g.fill(shape);
		g.dispose();
	}

	static Graphics2D graphics(BufferedImage image) {
		Graphics2D g = image.createGraphics();
		g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
		g.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
		g.setRenderingHint(RenderingHints.KEY_RENDERING, RenderingHints.VALUE_RENDER_QUALITY);
		return g;
	}

}
