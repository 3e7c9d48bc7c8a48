package org.assay.export.training;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.time.Instant;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.zip.ZipEntry;
import java.util.zip.ZipInputStream;

import org.assay.geo.FeatureKind;
import org.assay.geo.WebMercatorQuad.Tile;
import org.assay.geo.Wkb;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Geometry;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The training set's zip on hand-made geometries just north of the equator at zoom 18,
 * where a 6 m road covers 11 full rows of a tile it crosses (see {@link TileMaskTests}:
 * half width 3 m / 0.5971642834779395 m = 5.02 px, OGC 17-083r2 cell size at TileMatrix
 * 18).
 */
class TrainingSetWriterTests {

	private static final int ROW = (1 << 17) - 1;

	private static final int BAND = 11 * 256;

	private final JsonMapper json = JsonMapper.builder().build();

	@Test
	void masksAndManifestHoldEachTileTheRejectedDraftsCross() throws IOException {
		Tile t0 = new Tile(18, 140000, ROW);
		// road 1 crosses tiles 140000 and 140001 whole (and reaches 10 px into the tiles
		// either side); road 2 crosses 140000, 100 rows lower
		Geometry road1 = TileMaskTests.line(t0, -10, 100.5, 522, 100.5);
		Geometry road2 = TileMaskTests.line(t0, -10, 200.5, 266, 200.5);
		// a 10 x 10 pixel building in tile 140010
		Tile t10 = new Tile(18, 140010, ROW);
		Geometry building = Wkb.WGS84.createPolygon(TileMaskTests.ring(t10, 20, 20, 30, 30));
		Map<String, byte[]> zip = write(sample(1, FeatureKind.ROAD, "REJECT", "not-a-feature", road1, null),
				sample(2, FeatureKind.ROAD, "REJECT", "shape-wrong", road2, null),
				sample(3, FeatureKind.BUILDING, "REJECT", "not-a-feature", building, null));

		assertThat(zip).containsKeys("README.txt", "drafts.geojson", "corrected.geojson", "manifest.csv",
				"manifest.jsonl", "masks/18/140000/" + ROW + ".png", "masks/18/140001/" + ROW + ".png",
				"masks/18/139999/" + ROW + ".png", "masks/18/140002/" + ROW + ".png",
				"masks/18/140010/" + ROW + ".png");
		assertThat(zip.keySet()).noneMatch((name) -> name.startsWith("corrected/"));
		Map<String, String[]> rows = manifest(zip);
		assertThat(rows).hasSize(5);
		String[] first = rows.get("140000");
		assertThat(first[11]).isEqualTo("1 2");
		assertThat(first[12]).isEqualTo("not-a-feature shape-wrong");
		assertThat(first[13]).isEqualTo("REJECT REJECT");
		assertThat(first[14]).isEqualTo("masks/18/140000/" + ROW + ".png");
		assertThat(first[15]).isEqualTo(String.valueOf(2 * BAND));
		assertThat(first[16]).isEmpty();
		// road 2 reaches 10 px into tile 140001 too
		assertThat(rows.get("140001")[11]).isEqualTo("1 2");
		assertThat(Integer.parseInt(rows.get("140001")[15])).isGreaterThan(BAND).isLessThan(BAND + 11 * 16);
		assertThat(rows.get("140010")[15]).isEqualTo("100");
		assertThat(rows.get("140010")[12]).isEqualTo("not-a-feature");
		// the bounds are the tile's own
		assertThat(Double.parseDouble(first[3])).isEqualTo(t0.bounds4326().getMinX());
		assertThat(Double.parseDouble(first[10])).isEqualTo(t0.bounds3857().getMaxY());

		JsonNode drafts = this.json.readTree(zip.get("drafts.geojson"));
		assertThat(drafts.get("features")).hasSize(3);
		assertThat(drafts.get("features").get(1).get("properties").get("reason_code").asString())
			.isEqualTo("shape-wrong");
		assertThat(drafts.get("assay").get("about").asString()).contains("checked by people");
		assertThat(this.json.readTree(zip.get("corrected.geojson")).get("features")).isEmpty();
		assertThat(new String(zip.get("README.txt"), StandardCharsets.UTF_8)).contains("zoom 18", "6.0 m");
	}

	@Test
	void anAmendedDraftGetsACorrectedMaskOnTheTilesOfBothShapes() throws IOException {
		Tile t5 = new Tile(18, 140005, ROW);
		Geometry drafted = TileMaskTests.line(t5, 10, 50.5, 246, 50.5);
		// corrected: moved 100 rows down and lengthened across the whole tile
		Geometry corrected = TileMaskTests.line(t5, -10, 150.5, 266, 150.5);
		Map<String, byte[]> zip = write(sample(7, FeatureKind.ROAD, "AMEND", "geometry-adjusted", drafted, corrected));
		Map<String, String[]> rows = manifest(zip);
		String[] row = rows.get("140005");
		assertThat(row[11]).isEqualTo("7");
		assertThat(row[16]).isEqualTo("corrected/18/140005/" + ROW + ".png");
		assertThat(row[17]).isEqualTo(String.valueOf(BAND));
		assertThat(Integer.parseInt(row[15])).isLessThan(BAND).isGreaterThan(BAND * 9 / 10);
		// the corrected road reaches 10 px into each neighbour; the drafted one does not
		assertThat(rows).containsKeys("140004", "140006");
		assertThat(rows.get("140004")[15]).isEqualTo("0");
		assertThat(Integer.parseInt(rows.get("140004")[17])).isPositive();
		assertThat(this.json.readTree(zip.get("corrected.geojson")).get("features")).hasSize(1);
		JsonNode line = this.json.readTree(new String(zip.get("manifest.jsonl"), StandardCharsets.UTF_8).lines()
			.filter((l) -> l.contains("\"x\":140005"))
			.findFirst()
			.orElseThrow());
		assertThat(line.get("drafts").get(0).get("reason_code").asString()).isEqualTo("geometry-adjusted");
		assertThat(line.get("corrected_pixels").asInt()).isEqualTo(BAND);
		assertThat(line.get("bounds_3857")).hasSize(4);
	}

	@Test
	void aDiagonalRoadListsOnlyTheTilesItMarks() throws IOException {
		Tile t = new Tile(18, 140020, ROW - 10);
		// from the top-left corner of t to three tiles south-east: the box holds 4 x 4
		// tiles, the road marks only those near the diagonal
		Geometry road = TileMaskTests.line(t, 5, 5, 3 * 256 + 5, 3 * 256 + 5);
		Map<String, String[]> rows = manifest(
				write(sample(9, FeatureKind.ROAD, "REJECT", "not-a-feature", road, null)));
		assertThat(rows).containsKeys("140020/" + (ROW - 10), "140021/" + (ROW - 9), "140022/" + (ROW - 8),
				"140023/" + (ROW - 7));
		assertThat(rows.values()).allMatch((r) -> Integer.parseInt(r[15]) > 0);
		assertThat(rows.values()).noneMatch((r) -> r[1].equals("140023") && r[2].equals(String.valueOf(ROW - 10)));
		assertThat(rows.size()).isLessThan(16);
	}

	@Test
	void anEmptySetIsAValidZipWithEmptyFilesAndAHeader() throws IOException {
		Map<String, byte[]> zip = write();
		assertThat(new String(zip.get("manifest.csv"), StandardCharsets.UTF_8).strip())
			.isEqualTo("z,x,y,west,south,east,north,min_x,min_y,max_x,max_y,draft_ids,reason_codes,verdicts,mask,"
					+ "mask_pixels,corrected_mask,corrected_pixels");
		assertThat(this.json.readTree(zip.get("drafts.geojson")).get("features")).isEmpty();
		assertThat(zip.get("manifest.jsonl")).isEmpty();
	}

	private Map<String, byte[]> write(TrainingSample... samples) throws IOException {
		ByteArrayOutputStream out = new ByteArrayOutputStream();
		TrainingSetWriter.Summary summary;
		try (TrainingSetWriter writer = new TrainingSetWriter(out,
				new TrainingSetSpec(18, 6.0, "A test set; machine-drafted, checked by people."), this.json)) {
			for (TrainingSample sample : samples) {
				writer.add(sample);
			}
			summary = writer.finish();
		}
		assertThat(summary.samples()).isEqualTo(samples.length);
		Map<String, byte[]> entries = new LinkedHashMap<>();
		try (ZipInputStream in = new ZipInputStream(new ByteArrayInputStream(out.toByteArray()))) {
			for (ZipEntry entry = in.getNextEntry(); entry != null; entry = in.getNextEntry()) {
				entries.put(entry.getName(), in.readAllBytes());
			}
		}
		assertThat(entries.keySet().stream().filter((n) -> n.startsWith("masks/")).count()).isEqualTo(summary.tiles());
		return entries;
	}

	/** The manifest's rows by tile column, for tiles of one row; fields as in the CSV. */
	private static Map<String, String[]> manifest(Map<String, byte[]> zip) {
		List<String> lines = new String(zip.get("manifest.csv"), StandardCharsets.UTF_8).lines().toList();
		Map<String, String[]> rows = new LinkedHashMap<>();
		for (String line : lines.subList(1, lines.size())) {
			String[] fields = line.split(",", -1);
			assertThat(fields).hasSize(18);
			rows.put(fields[1] + (fields[2].equals(String.valueOf(ROW)) ? "" : "/" + fields[2]), fields);
		}
		return rows;
	}

	private static TrainingSample sample(long id, FeatureKind kind, String verdict, String reason, Geometry drafted,
			Geometry corrected) {
		return new TrainingSample(id, "s-" + id, kind, null, 0.8, verdict, reason,
				Instant.parse("2026-12-01T10:00:00Z"), drafted, corrected);
	}

}
