package org.assay.imagery;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.geom.AffineTransform;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;

import org.assay.demo.DemoDraft;
import org.assay.demo.DemoScenario;
import org.assay.demo.DemoWorld;
import org.assay.demo.DemoWorld.HiddenStretch;
import org.assay.demo.FaultClass;
import org.assay.demo.PlantedFault;
import org.assay.geo.FeatureKind;
import org.assay.geo.WebMercatorQuad;
import org.assay.geo.WebMercatorQuad.Tile;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;

/**
 * Writes 3 x 3 mosaics of tiles to a folder for a person to look at: over the first
 * village and the first hidden road stretch at zoom 14, 16 and 18, and at zoom 17 under
 * the first few falsely detected and shifted road drafts, drawn over the imagery in
 * orange. Not a test; run it by hand with the folder as its argument.
 */
final class TilePreview {

	private TilePreview() {
	}

	public static void main(String[] args) throws IOException {
		Path out = Path.of((args.length > 0) ? args[0] : "/tmp/assay-imagery-preview");
		Files.createDirectories(out);
		DemoScenario scenario = DemoWorldHolder.scenario();
		DemoWorld world = scenario.world();
		DemoTileRenderer renderer = new DemoTileRenderer(world);
		HiddenStretch hidden = world.hiddenStretches().get(0);
		for (int z : new int[] { 14, 16, 18 }) {
			write(out.resolve("village-z" + z + ".png"), renderer, world.villages().get(0).centre().getCoordinate(), z,
					null);
			write(out.resolve("woods-z" + z + ".png"), renderer, hidden.geometry().getCentroid().getCoordinate(), z,
					null);
		}
		Map<String, PlantedFault> truth = scenario.truth();
		int[] written = new int[FaultClass.values().length];
		for (DemoDraft draft : scenario.drafts()) {
			FaultClass fault = truth.get(draft.id()).faultClass();
			if (draft.kind() != FeatureKind.ROAD || (fault != FaultClass.FALSE_DETECTION && fault != FaultClass.SHIFTED)
					|| written[fault.ordinal()]++ >= 3) {
				continue;
			}
			write(out.resolve(fault.name().toLowerCase() + "-" + draft.id() + "-z17.png"), renderer,
					draft.geometry().getCentroid().getCoordinate(), 17, draft.geometry());
			System.out.println(draft.id() + " " + fault + ": " + truth.get(draft.id()).detail());
		}
	}

	private static void write(Path file, DemoTileRenderer renderer, Coordinate at, int z, Geometry overlay)
			throws IOException {
		Tile centre = WebMercatorQuad.tileAt(at.x, at.y, z);
		BufferedImage mosaic = new BufferedImage(768, 768, BufferedImage.TYPE_INT_RGB);
		Graphics2D g = DemoTileRenderer.graphics(mosaic);
		for (int dx = -1; dx <= 1; dx++) {
			for (int dy = -1; dy <= 1; dy++) {
				g.drawImage(renderer.render(new Tile(z, centre.x() + dx, centre.y() + dy)), (dx + 1) * 256,
						(dy + 1) * 256, null);
			}
		}
		if (overlay != null) {
			TileFrame frame = new TileFrame(new Tile(z, centre.x() - 1, centre.y() - 1));
			g.setColor(new Color(0xE6, 0x9F, 0x00));
			g.setStroke(
					new BasicStroke(2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f, new float[] { 8, 4 }, 0));
			g.draw(AffineTransform.getTranslateInstance(0, 0).createTransformedShape(frame.path(overlay)));
		}
		g.dispose();
		Files.write(file, DemoImagery.png(mosaic));
	}

}
