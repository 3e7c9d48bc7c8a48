package org.assay.imagery;

import java.awt.Color;
import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.time.Instant;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.zip.ZipEntry;
import java.util.zip.ZipInputStream;

import javax.imageio.ImageIO;

import org.assay.demo.DemoDraft;
import org.assay.demo.DemoWorld;
import org.assay.demo.DemoWorld.RoadClass;
import org.assay.demo.FaultClass;
import org.assay.demo.PlantedFault;
import org.assay.export.training.TrainingSample;
import org.assay.export.training.TrainingSetSpec;
import org.assay.export.training.TrainingSetWriter;
import org.assay.geo.FeatureKind;
import org.assay.geo.WebMercatorQuad.Tile;
import org.junit.jupiter.api.Test;
import tools.jackson.databind.json.JsonMapper;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The training set's masks line up with the demo imagery tile for tile: the demo's
 * shifted paved roads, amended to their true place, and its false road detections,
 * rejected, are written as a training set at zoom 18, and each mask is laid over the demo
 * imagery tile of the same z/x/y. Under the corrected masks the imagery shows road grey;
 * under the drafted masks of shifted roads and false detections it mostly does not.
 */
class TrainingMasksOnDemoImageryTests {

	@Test
	void correctedMasksFallOnRoadGreyAndDraftedOnesMostlyBeside() throws IOException {
		DemoWorld world = DemoWorldHolder.get();
		Map<String, DemoWorld.Road> roads = new HashMap<>();
		world.roads().forEach((road) -> roads.put(road.id(), road));
		Map<String, PlantedFault> truth = DemoWorldHolder.scenario().truth();
		ByteArrayOutputStream out = new ByteArrayOutputStream();
		long shifted = 0;
		long rejected = 0;
		// 2 m: narrower than any paved road of the demo, so a corrected mask stays on it
		try (TrainingSetWriter writer = new TrainingSetWriter(out, new TrainingSetSpec(18, 2.0, "demo line-up"),
				JsonMapper.builder().build())) {
			for (DemoDraft draft : DemoWorldHolder.scenario().drafts()) {
				PlantedFault fault = truth.get(draft.id());
				if (fault.kind() != FeatureKind.ROAD) {
					continue;
				}
				DemoWorld.Road road = (fault.worldId() != null) ? roads.get(fault.worldId()) : null;
				if (fault.faultClass() == FaultClass.SHIFTED && road != null && road.roadClass() != RoadClass.TRACK
						&& fault.deviationMetres() > road.widthMetres()) {
					writer.add(sample(draft, "AMEND", "geometry-adjusted", fault));
					shifted++;
				}
				else if (fault.faultClass() == FaultClass.FALSE_DETECTION) {
					writer.add(sample(draft, "REJECT", "not-a-feature", null));
					rejected++;
				}
			}
			writer.finish();
		}
		assertThat(shifted).as("shifted paved roads in the demo").isGreaterThan(3);
		assertThat(rejected).as("false road detections in the demo").isGreaterThan(3);

		Map<String, byte[]> zip = entries(out.toByteArray());
		DemoTileRenderer renderer = new DemoTileRenderer(world);
		long[] corrected = new long[2];
		long[] drafted = new long[2];
		List<String> manifest = new String(zip.get("manifest.csv"), StandardCharsets.UTF_8).lines().skip(1).toList();
		for (String line : manifest) {
			String[] f = line.split(",", -1);
			Tile tile = new Tile(Integer.parseInt(f[0]), Integer.parseInt(f[1]), Integer.parseInt(f[2]));
			BufferedImage imagery = renderer.render(tile);
			count(imagery, decode(zip.get(f[14])), drafted);
			if (!f[16].isEmpty()) {
				count(imagery, decode(zip.get(f[16])), corrected);
			}
		}
		double onRoadCorrected = (double) corrected[1] / corrected[0];
		double onRoadDrafted = (double) drafted[1] / drafted[0];
		System.out.printf(
				"Demo masks on demo imagery (z18): %d tiles; road grey under corrected masks %.3f of %d"
						+ " px, under drafted masks %.3f of %d px%n",
				manifest.size(), onRoadCorrected, corrected[0], onRoadDrafted, drafted[0]);
		assertThat(onRoadCorrected).isGreaterThan(0.8);
		assertThat(onRoadDrafted).isLessThan(onRoadCorrected - 0.4);
	}

	/** Adds the marked pixels of a mask, and those over road grey, to {@code counts}. */
	private static void count(BufferedImage imagery, BufferedImage mask, long[] counts) {
		for (int y = 0; y < 256; y++) {
			for (int x = 0; x < 256; x++) {
				if (mask.getRaster().getSample(x, y, 0) != 0) {
					counts[0]++;
					Color colour = new Color(imagery.getRGB(x, y));
					counts[1] += (DemoTileRendererTests.classify(colour) == DemoTileRendererTests.Look.ROAD_GREY) ? 1
							: 0;
				}
			}
		}
	}

	private static TrainingSample sample(DemoDraft draft, String verdict, String reason, PlantedFault fault) {
		return new TrainingSample(draft.id().hashCode(), draft.id(), draft.kind(), draft.featureClass(),
				draft.confidence(), verdict, reason, Instant.parse("2026-12-01T10:00:00Z"), draft.geometry(),
				(fault != null) ? fault.trueGeometry() : null);
	}

	private static BufferedImage decode(byte[] png) throws IOException {
		return ImageIO.read(new ByteArrayInputStream(png));
	}

	private static Map<String, byte[]> entries(byte[] zip) throws IOException {
		Map<String, byte[]> entries = new HashMap<>();
		try (ZipInputStream in = new ZipInputStream(new ByteArrayInputStream(zip))) {
			for (ZipEntry entry = in.getNextEntry(); entry != null; entry = in.getNextEntry()) {
				entries.put(entry.getName(), in.readAllBytes());
			}
		}
		return entries;
	}

}
