package org.assay.imagery;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;
import java.util.List;

import org.assay.demo.DemoWorld.Field;
import org.locationtech.jts.geom.Point;

/**
 * Paints fields: a tone by cover, and when the pixels are small enough to show them, the
 * rows of a crop (thin, faint and close, never mistakable for a track) or the trees of an
 * orchard, laid out from the field's centroid at an angle of its own.
 */
final class FieldPainter {

	private static final double ROW_SPACING_METRES = 2.5;

	private static final double TREE_SPACING_METRES = 6;

	private final Graphics2D g;

	private final TileFrame frame;

	FieldPainter(Graphics2D g, TileFrame frame) {
		this.g = g;
		this.frame = frame;
	}

	void paint(List<Field> fields) {
		for (Field field : fields) {
			Path2D outline = this.frame.path(field.geometry());
			Color tone = Palette.field(field.cover(), field.id());
			this.g.setColor(tone);
			this.g.fill(outline);
			if ("crop".equals(field.cover()) && this.frame.pixels(ROW_SPACING_METRES) >= 3) {
				pattern(field, outline, tone, false);
			}
			else if ("orchard".equals(field.cover()) && this.frame.pixels(TREE_SPACING_METRES) >= 3) {
				pattern(field, outline, tone, true);
			}
		}
	}

	private void pattern(Field field, Path2D outline, Color tone, boolean trees) {
		Graphics2D clipped = (Graphics2D) this.g.create();
		clipped.clip(outline);
		Point centre = field.geometry().getCentroid();
		double cx = this.frame.px(centre.getX());
		double cy = this.frame.py(centre.getY());
		clipped.rotate(Noise.hash(field.id().hashCode(), 13, 0) * Math.PI, cx, cy);
		Rectangle2D box = outline.getBounds2D();
		double reach = Math.hypot(box.getWidth(), box.getHeight())
				+ Math.hypot(box.getCenterX() - cx, box.getCenterY() - cy);
		if (trees) {
			trees(clipped, cx, cy, reach);
		}
		else {
			rows(clipped, tone, cx, cy, reach);
		}
		clipped.dispose();
	}

	private void rows(Graphics2D g, Color tone, double cx, double cy, double reach) {
		double spacing = this.frame.pixels(ROW_SPACING_METRES);
		g.setColor(new Color(Palette.darker(tone, 0.86).getRGB() & 0xFFFFFF | 0x70000000, true));
		g.setStroke(new BasicStroke((float) (spacing * 0.35)));
		for (double t = -Math.floor(reach / spacing) * spacing; t <= reach; t += spacing) {
			g.draw(new Line2D.Double(cx - reach, cy + t, cx + reach, cy + t));
		}
	}

	private void trees(Graphics2D g, double cx, double cy, double reach) {
		double spacing = this.frame.pixels(TREE_SPACING_METRES);
		double radius = this.frame.pixels(1.8);
		g.setColor(Palette.ORCHARD_TREE);
		int n = (int) Math.ceil(reach / spacing);
		for (int i = -n; i <= n; i++) {
			for (int j = -n; j <= n; j++) {
				double x = cx + i * spacing;
				double y = cy + j * spacing;
				g.fill(new Ellipse2D.Double(x - radius, y - radius, 2 * radius, 2 * radius));
			}
		}
	}

}
