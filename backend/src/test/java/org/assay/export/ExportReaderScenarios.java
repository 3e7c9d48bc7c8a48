package org.assay.export;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.UUID;
import java.util.concurrent.TimeUnit;

import org.assay.accounts.AccountService;
import org.assay.accounts.Role;
import org.assay.support.ApiClient;
import org.assay.support.TestBatches;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import tools.jackson.databind.JsonNode;

import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.web.server.LocalServerPort;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assumptions.assumeThat;

/**
 * The verified exports read back by an independent reader, GDAL's {@code ogrinfo} (Debian
 * package gdal-bin): layers, feature counts, geometry types, the CRS and values. Without
 * ogrinfo the tests are skipped, except with {@code CI=true}, where they fail. Run by
 * subclasses on each database.
 */
abstract class ExportReaderScenarios {

	private static final Path OGRINFO = Path.of("/usr/bin/ogrinfo");

	@LocalServerPort
	int port;

	@Autowired
	AccountService accounts;

	@TempDir
	Path folder;

	ApiClient lead;

	ApiClient validator;

	long batchId;

	/** Expected: source id to verdict, for the kept drafts. */
	Map<String, String> kept = new HashMap<>();

	@BeforeEach
	void reviewABatch() {
		if (!"true".equals(System.getenv("CI"))) {
			assumeThat(Files.isExecutable(OGRINFO)).as("ogrinfo (apt-get install gdal-bin)").isTrue();
		}
		String suffix = UUID.randomUUID().toString().substring(0, 8);
		this.accounts.create("lead-" + suffix, "Lead " + suffix, "lead-pass-" + suffix, Role.LEAD);
		this.accounts.create("val-" + suffix, "Validator " + suffix, "val-pass-" + suffix, Role.VALIDATOR);
		this.lead = ApiClient.signIn(this.port, "lead-" + suffix, "lead-pass-" + suffix);
		this.validator = ApiClient.signIn(this.port, "val-" + suffix, "val-pass-" + suffix);
		ApiClient.Response upload = this.lead.upload(Map.of("name", "export, read back", "modelName", "segmenter",
				"modelVersion", "7.2", "maxDraftsPerCell", "100", "secondReviewShare", "0"),
				Map.of("drafts", TestBatches.drafts(30, 10)), "wait=true");
		assertThat(upload.status()).as(upload.text()).isEqualTo(201);
		this.batchId = upload.json().get("batchId").asLong();
		long cellId = this.validator.post("/api/batches/" + this.batchId + "/claims/next", null)
			.json()
			.get("id")
			.asLong();
		for (JsonNode draft : this.validator.get("/api/cells/" + cellId + "/drafts").json().get("features")) {
			String sourceId = draft.get("properties").get("sourceId").asString();
			int n = Integer.parseInt(sourceId.substring(2));
			boolean road = sourceId.startsWith("r-");
			Map<String, Object> body = new HashMap<>(Map.of("draftId", draft.get("id").asLong()));
			if (road && n % 5 == 0) {
				body.put("verdict", "REJECT");
				body.put("reasonCode", "not-a-feature");
			}
			else if (road && n % 7 == 1) {
				body.put("verdict", "AMEND");
				body.put("reasonCode", "geometry-adjusted");
				body.put("geometry", Map.of("type", "LineString", "coordinates",
						List.of(List.of(-31.75, 40.9), List.of(-31.749, 40.9001), List.of(-31.748, 40.9))));
				this.kept.put(sourceId, "AMEND");
			}
			else {
				body.put("verdict", "ACCEPT");
				this.kept.put(sourceId, "ACCEPT");
			}
			ApiClient.Response given = this.validator.put("/api/verdicts/" + UUID.randomUUID(), body);
			assertThat(given.status()).as(given.text()).isEqualTo(201);
		}
	}

	@Test
	void ogrinfoReadsTheGeoPackageWithItsLayersCrsIndexAndValues() throws Exception {
		Path file = download("/api/batches/" + this.batchId + "/export.gpkg", "verified.gpkg");
		long roads = this.kept.keySet().stream().filter((id) -> id.startsWith("r-")).count();
		String summary = ogrinfo("-ro", "-so", "-al", file.toString());
		assertThat(summary).contains("using driver `GPKG' successful");
		assertThat(layer(summary, "roads")).contains("Geometry: Multi Line String")
			.contains("Feature Count: " + roads)
			.contains("ID[\"EPSG\",4326]")
			.contains("Machine-drafted features", "checked by people")
			.contains("verdict: String", "reviews: Integer", "ruled: Integer(Boolean)", "decided_at: DateTime");
		assertThat(layer(summary, "buildings")).contains("Geometry: Multi Polygon").contains("Feature Count: 10");
		// the R-tree of the spatial index extension is found and used
		String index = ogrinfo("-ro", file.toString(), "-sql", "SELECT HasSpatialIndex('roads', 'geom')");
		assertThat(index).contains("= 1");

		String amended = ogrinfo("-ro", "-al", "-q", "-where", "source_id = 'r-1'", file.toString());
		assertThat(amended).contains("verdict (String) = AMEND")
			.contains("reason_code (String) = geometry-adjusted")
			.contains("model_version (String) = 7.2")
			.contains("agreement (String) = single")
			.contains("MULTILINESTRING ((-31.75 40.9,-31.749 40.9001,-31.748 40.9))");
		String rejected = ogrinfo("-ro", "-al", "-q", "-where", "source_id = 'r-5'", file.toString());
		assertThat(rejected).doesNotContain("OGRFeature");
	}

	@Test
	void ogrinfoReadsTheGeoJsonExport() throws Exception {
		Path file = download("/api/batches/" + this.batchId + "/export.geojson", "verified.geojson");
		String summary = ogrinfo("-ro", "-so", "-al", file.toString());
		assertThat(summary).contains("using driver `GeoJSON' successful")
			.contains("Feature Count: " + this.kept.size())
			.contains("ID[\"EPSG\",4326]");
		String building = ogrinfo("-ro", "-al", "-q", "-where", "source_id = 'b-3'", file.toString());
		assertThat(building).contains("verdict (String) = ACCEPT").contains("POLYGON ((");
	}

	@Test
	void optionsNarrowTheExport() throws Exception {
		// a polygon around road r-2 only (TestBatches: road i runs from -31.7 + 0.002 i,
		// 0.001 degrees long at latitude 40.9; the buildings lie north of 40.9005)
		String within = "{\"type\":\"Polygon\",\"coordinates\":[[[-31.6961,40.8999],[-31.6945,40.8999],"
				+ "[-31.6945,40.9003],[-31.6961,40.9003],[-31.6961,40.8999]]]}";
		ApiClient.Response narrowed = this.lead.get("/api/batches/" + this.batchId + "/export.geojson?within="
				+ java.net.URLEncoder.encode(within, StandardCharsets.UTF_8));
		assertThat(narrowed.status()).as(narrowed.text()).isEqualTo(200);
		List<String> ids = new ArrayList<>();
		narrowed.json().get("features").forEach((f) -> ids.add(f.get("properties").get("source_id").asString()));
		assertThat(ids).as(narrowed.text()).containsExactly("r-2");
		ApiClient.Response twice = this.lead
			.get("/api/batches/" + this.batchId + "/export.geojson?onlyReviewedTwice=true");
		assertThat(twice.json().get("features")).isEmpty();
		assertThat(this.lead.get("/api/batches/" + this.batchId + "/export.gpkg?within=%7B%22type%22:1%7D").status())
			.isEqualTo(400);
		assertThat(this.validator.get("/api/batches/" + this.batchId + "/export.gpkg").status()).isEqualTo(403);
	}

	@Test
	void gdalReadsTheTrainingSetZipItsGeoJsonAndItsMasks() throws Exception {
		Path file = download("/api/batches/" + this.batchId + "/training.zip?amended=true", "training.zip");
		String zip = "/vsizip/" + file;
		long rejected = 40 - this.kept.size(); // 30 roads and 10 buildings, the rest kept
		long amended = this.kept.values().stream().filter("AMEND"::equals).count();
		assertThat(ogrinfo("-ro", "-so", "-al", zip + "/drafts.geojson")).contains("using driver `GeoJSON' successful")
			.contains("Feature Count: " + (rejected + amended))
			.contains("ID[\"EPSG\",4326]");
		assertThat(ogrinfo("-ro", "-so", "-al", zip + "/corrected.geojson")).contains("Feature Count: " + amended);
		String rejectedRoad = ogrinfo("-ro", "-al", "-q", "-where", "source_id = 'r-5'", zip + "/drafts.geojson");
		assertThat(rejectedRoad).contains("verdict (String) = REJECT").contains("reason_code (String) = not-a-feature");

		// each tile's mask as GDAL reads it: 256 x 256, one Byte band, and as many pixels
		// at 255 as the manifest says
		List<String> manifest = entry(file, "manifest.csv").lines().toList();
		assertThat(manifest).hasSizeGreaterThan(1);
		for (String line : manifest.subList(1, manifest.size())) {
			String[] f = line.split(",", -1);
			assertThat(f[0]).isEqualTo("18");
			String info = gdalinfo("-hist", zip + "/" + f[14]);
			assertThat(info).contains("Driver: PNG/Portable Network Graphics")
				.contains("Size is 256, 256")
				.contains("Band 1 Block=256x1 Type=Byte");
			assertThat(marked(info)).as(line).isEqualTo(Long.parseLong(f[15]));
			if (!f[16].isEmpty()) {
				assertThat(marked(gdalinfo("-hist", zip + "/" + f[16]))).as(line).isEqualTo(Long.parseLong(f[17]));
			}
		}
		assertThat(entry(file, "README.txt")).contains("checked by people", "zoom 18");

		// only one reason code; a code the catalogue lacks is refused
		ApiClient.Response narrowed = this.lead
			.get("/api/batches/" + this.batchId + "/training.zip?reasons=shape-wrong");
		assertThat(narrowed.status()).isEqualTo(200);
		Path empty = this.folder.resolve("narrowed.zip");
		Files.write(empty, narrowed.body());
		assertThat(ogrinfo("-ro", "-so", "-al", "/vsizip/" + empty + "/drafts.geojson")).contains("Feature Count: 0");
		ApiClient.Response unknown = this.lead.get("/api/batches/" + this.batchId + "/training.zip?reasons=nonsense");
		assertThat(unknown.status()).isEqualTo(400);
		assertThat(unknown.text()).contains("nonsense", "not-a-feature");
		assertThat(this.lead.get("/api/batches/" + this.batchId + "/training.zip?zoom=30").status()).isEqualTo(400);
		assertThat(this.validator.get("/api/batches/" + this.batchId + "/training.zip").status()).isEqualTo(403);
	}

	/** The count in the last bucket (255) of gdalinfo's 256-bucket histogram. */
	private static long marked(String gdalinfo) {
		int at = gdalinfo.indexOf("256 buckets from -0.5 to 255.5:");
		assertThat(at).as(gdalinfo).isNotNegative();
		String[] counts = gdalinfo.substring(at).lines().skip(1).findFirst().orElseThrow().trim().split("\\s+");
		assertThat(counts).hasSize(256);
		return Long.parseLong(counts[255]);
	}

	private static String entry(Path zip, String name) throws IOException {
		try (java.util.zip.ZipFile file = new java.util.zip.ZipFile(zip.toFile())) {
			return new String(file.getInputStream(file.getEntry(name)).readAllBytes(), StandardCharsets.UTF_8);
		}
	}

	static String gdalinfo(String... args) throws IOException, InterruptedException {
		List<String> command = new ArrayList<>(List.of("/usr/bin/gdalinfo"));
		command.addAll(List.of(args));
		return run(command);
	}

	private Path download(String path, String name) throws IOException {
		ApiClient.Response response = this.lead.get(path);
		assertThat(response.status()).as(response.text()).isEqualTo(200);
		Path file = this.folder.resolve(name);
		Files.write(file, response.body());
		return file;
	}

	/** The part of ogrinfo's summary about one layer. */
	private static String layer(String summary, String name) {
		int start = summary.indexOf("Layer name: " + name);
		assertThat(start).as("layer " + name + " in\n" + summary).isNotNegative();
		int end = summary.indexOf("Layer name: ", start + 1);
		return summary.substring(start, (end < 0) ? summary.length() : end);
	}

	static String ogrinfo(String... args) throws IOException, InterruptedException {
		List<String> command = new ArrayList<>(List.of(OGRINFO.toString()));
		command.addAll(List.of(args));
		return run(command);
	}

	private static String run(List<String> command) throws IOException, InterruptedException {
		Process process = new ProcessBuilder(command).redirectErrorStream(true).start();
		String out = new String(process.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
		assertThat(process.waitFor(60, TimeUnit.SECONDS)).isTrue();
		assertThat(process.exitValue()).as(out).isZero();
		return out;
	}

}
