package org.assay.export.training;

import java.io.BufferedWriter;
import java.io.FilterOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.stream.Stream;
import java.util.zip.CRC32;
import java.util.zip.ZipEntry;
import java.util.zip.ZipOutputStream;

import org.assay.geo.FeatureKind;
import org.assay.geo.GeoJsonGeometries;
import org.assay.geo.WebMercatorQuad;
import org.assay.geo.WebMercatorQuad.Tile;
import org.assay.geo.Wkb;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.prep.PreparedGeometry;
import org.locationtech.jts.geom.prep.PreparedGeometryFactory;
import tools.jackson.core.JsonGenerator;
import tools.jackson.databind.ObjectMapper;

/**
 * Writes a hard-negative training set as one zip, streamed:
 *
 * <ul>
 * <li>{@code README.txt}: what the set holds, how it was cut, and the caution;</li>
 * <li>{@code drafts.geojson}: every sample as the model drafted it, with its verdict and
 * reason code;</li>
 * <li>{@code corrected.geojson}: the amended samples as the validators corrected
 * them;</li>
 * <li>{@code masks/{z}/{x}/{y}.png}: for each WebMercatorQuad tile a sample touches, a
 * 256 x 256 single-band mask of the drafted geometries (0 or 255);</li>
 * <li>{@code corrected/{z}/{x}/{y}.png}: the same for the corrected geometries, on the
 * tiles that hold an amended sample;</li>
 * <li>{@code manifest.csv} and {@code manifest.jsonl}: one row per tile with z/x/y, its
 * bounds in EPSG:4326 and EPSG:3857, the drafts and reason codes it holds and the pixel
 * count of each mask.</li>
 * </ul>
 *
 * <p>
 * Memory stays flat whatever the number of samples: {@link #add} writes the sample's
 * GeoJSON at once and spools its geometries and the tiles it may touch to an SQLite file
 * in a temporary folder; {@link #finish} lets SQLite sort the tile keys (on disk) and
 * draws one tile at a time, from the north-west, row by row. The folder is removed on
 * {@link #close}.
 */
public final class TrainingSetWriter implements AutoCloseable {

	/** Tiles above this number are checked one by one against the geometry. */
	private static final int BOX_TILES_TRUSTED = 4;

	private static final double METRES_PER_DEGREE = 110_000;

	private static final String MANIFEST_HEADER = "z,x,y,west,south,east,north,min_x,min_y,max_x,max_y,"
			+ "draft_ids,reason_codes,verdicts,mask,mask_pixels,corrected_mask,corrected_pixels";

	private final ZipOutputStream zip;

	private final TrainingSetSpec spec;

	private final ObjectMapper json;

	private final Path folder;

	private final Connection spool;

	private final PreparedStatement addSample;

	private final PreparedStatement addTouch;

	private final JsonGenerator drafts;

	private long samples;

	private long corrected;

	private long touches;

	private boolean finished;

	private final long startedAt = System.nanoTime();

	/**
	 * Starts the zip: writes the README and opens {@code drafts.geojson}.
	 * @param out where the zip goes; closed by {@link #finish}
	 * @param spec the zoom, road width and README text
	 * @param json writes the GeoJSON
	 * @throws IOException when the spool cannot be made or the output fails
	 */
	public TrainingSetWriter(OutputStream out, TrainingSetSpec spec, ObjectMapper json) throws IOException {
		this.spec = spec;
		this.json = json;
		this.folder = Files.createTempDirectory("assay-training-");
		try {
			this.spool = DriverManager.getConnection("jdbc:sqlite:" + this.folder.resolve("spool.db"));
			try (Statement s = this.spool.createStatement()) {
				s.execute("pragma journal_mode = off");
				s.execute("pragma synchronous = off");
				s.execute("pragma temp_store = file");
				s.execute("pragma cache_size = -16000");
				s.execute("create table sample (id integer primary key, draft_id integer, source_id text, kind text,"
						+ " class text, confidence real, verdict text, reason text, decided_at text,"
						+ " drafted blob, corrected blob)");
				s.execute("create table touch (tile integer, sample integer)");
			}
			this.spool.setAutoCommit(false);
			this.addSample = this.spool.prepareStatement("insert into sample values (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)");
			this.addTouch = this.spool.prepareStatement("insert into touch values (?, ?)");
		}
		catch (SQLException ex) {
			deleteFolder();
			throw new IOException("Could not open the training set's spool", ex);
		}
		this.zip = new ZipOutputStream(out, StandardCharsets.UTF_8);
		text("README.txt", readme());
		this.zip.putNextEntry(new ZipEntry("drafts.geojson"));
		this.drafts = startCollection("drafts as the model drafted them");
	}

	/**
	 * Adds a sample: writes it to {@code drafts.geojson} and spools it for the masks.
	 * @param sample a rejected or amended draft
	 */
	public void add(TrainingSample sample) {
		if (this.finished) {
			throw new IllegalStateException("the training set is finished");
		}
		long id = ++this.samples;
		writeFeature(this.drafts, sample.draftId(), sample.sourceId(), sample.kind().jsonName(), sample.featureClass(),
				sample.confidence(), sample.verdict(), sample.reasonCode(), sample.decidedAt().toString(),
				sample.drafted());
		try {
			PreparedStatement s = this.addSample;
			s.setLong(1, id);
			s.setLong(2, sample.draftId());
			s.setString(3, sample.sourceId());
			s.setString(4, sample.kind().jsonName());
			s.setString(5, sample.featureClass());
			s.setDouble(6, sample.confidence());
			s.setString(7, sample.verdict());
			s.setString(8, sample.reasonCode());
			s.setString(9, sample.decidedAt().toString());
			s.setBytes(10, Wkb.write(sample.drafted()));
			s.setBytes(11, (sample.corrected() != null) ? Wkb.write(sample.corrected()) : null);
			s.executeUpdate();
			Set<Long> keys = new LinkedHashSet<>(tileKeys(sample.drafted(), sample.kind()));
			if (sample.corrected() != null) {
				this.corrected++;
				keys.addAll(tileKeys(sample.corrected(), sample.kind()));
			}
			for (long key : keys) {
				this.addTouch.setLong(1, key);
				this.addTouch.setLong(2, id);
				this.addTouch.addBatch();
			}
			this.addTouch.executeBatch();
			this.touches += keys.size();
		}
		catch (SQLException ex) {
			throw new IllegalStateException("Could not spool draft " + sample.draftId(), ex);
		}
	}

	/**
	 * Writes the corrected GeoJSON, the masks and the manifests, and closes the zip.
	 * @return what was written
	 * @throws IOException when the output fails
	 */
	public Summary finish() throws IOException {
		this.finished = true;
		long finishing = System.nanoTime();
		endCollection(this.drafts);
		this.zip.closeEntry();
		try {
			this.spool.commit();
			try (Statement s = this.spool.createStatement()) {
				s.execute("create index touch_by_tile on touch (tile, sample)");
			}
			writeCorrected();
			long tilesFrom = System.nanoTime();
			Summary summary = writeTiles(finishing - this.startedAt, tilesFrom - finishing);
			this.zip.finish();
			this.zip.flush();
			return summary;
		}
		catch (SQLException ex) {
			throw new IOException("Could not read the training set's spool", ex);
		}
	}

	@Override
	public void close() {
		try {
			this.addSample.close();
			this.addTouch.close();
			this.spool.close();
		}
		catch (SQLException ex) {
			// the folder goes anyway
		}
		deleteFolder();
	}

	/**
	 * What a training set holds.
	 *
	 * @param samples drafts in it
	 * @param corrected amended drafts among them
	 * @param tiles tiles with a mask
	 * @param maskPixels marked pixels over all drafted masks
	 * @param correctedPixels marked pixels over all corrected masks
	 * @param spoolNanos time spent taking samples in (reading them included)
	 * @param sortNanos time spent indexing the spool and writing the corrected GeoJSON
	 * @param tileNanos time spent drawing and writing the masks and the manifests
	 */
	public record Summary(long samples, long corrected, long tiles, long maskPixels, long correctedPixels,
			long spoolNanos, long sortNanos, long tileNanos) {
	}

	/** The keys of the tiles a geometry may touch, widened by half a road's width. */
	private List<Long> tileKeys(Geometry geometry, FeatureKind kind) {
		double margin = (kind == FeatureKind.ROAD) ? this.spec.roadWidthMetres() / 2 : 0;
		List<Tile> tiles = TileCover.of(geometry, margin, this.spec.zoom());
		List<Long> keys = new ArrayList<>(tiles.size());
		if (tiles.size() <= BOX_TILES_TRUSTED) {
			tiles.forEach((tile) -> keys.add(key(tile)));
			return keys;
		}
		PreparedGeometry prepared = PreparedGeometryFactory.prepare(geometry);
		double dLat = (margin + 1) / METRES_PER_DEGREE;
		double dLon = dLat / Math.max(1e-6, Math.cos(Math.toRadians(geometry.getEnvelopeInternal().centre().y)));
		for (Tile tile : tiles) {
			Envelope near = tile.bounds4326();
			near.expandBy(dLon, dLat);
			if (prepared.intersects(geometry.getFactory().toGeometry(near))) {
				keys.add(key(tile));
			}
		}
		return keys;
	}

	private long key(Tile tile) {
		return ((long) tile.y() << this.spec.zoom()) | tile.x();
	}

	private Tile tile(long key) {
		int z = this.spec.zoom();
		return new Tile(z, (int) (key & ((1L << z) - 1)), (int) (key >>> z));
	}

	private void writeCorrected() throws IOException, SQLException {
		this.zip.putNextEntry(new ZipEntry("corrected.geojson"));
		JsonGenerator out = startCollection("amended drafts as the validators corrected them");
		try (Statement s = this.spool.createStatement();
				ResultSet rs = s.executeQuery("select draft_id, source_id, kind, class, confidence, verdict, reason,"
						+ " decided_at, corrected from sample where corrected is not null order by id")) {
			while (rs.next()) {
				writeFeature(out, rs.getLong(1), rs.getString(2), rs.getString(3), rs.getString(4), rs.getDouble(5),
						rs.getString(6), rs.getString(7), rs.getString(8), Wkb.read(rs.getBytes(9)));
			}
		}
		endCollection(out);
		this.zip.closeEntry();
	}

	private Summary writeTiles(long spoolNanos, long sortNanos) throws IOException, SQLException {
		long start = System.nanoTime();
		Path csv = this.folder.resolve("manifest.csv");
		Path jsonl = this.folder.resolve("manifest.jsonl");
		long tiles = 0;
		long maskPixels = 0;
		long correctedPixels = 0;
		try (BufferedWriter csvOut = Files.newBufferedWriter(csv, StandardCharsets.UTF_8);
				BufferedWriter jsonOut = Files.newBufferedWriter(jsonl, StandardCharsets.UTF_8);
				Statement s = this.spool.createStatement();
				ResultSet rs = s.executeQuery("select t.tile, s.draft_id, s.source_id, s.kind, s.verdict, s.reason,"
						+ " s.drafted, s.corrected from touch t join sample s on s.id = t.sample"
						+ " order by t.tile, t.sample")) {
			csvOut.write(MANIFEST_HEADER);
			csvOut.write('\n');
			TileGroup group = null;
			while (rs.next()) {
				long key = rs.getLong(1);
				if (group == null || group.key != key) {
					if (group != null && group.write()) {
						tiles++;
						maskPixels += group.drafted.count();
						correctedPixels += (group.corrected != null) ? group.corrected.count() : 0;
						group.manifest(csvOut, jsonOut);
					}
					group = new TileGroup(key, tile(key));
				}
				FeatureKind kind = FeatureKind.fromJson(rs.getString(4));
				byte[] correctedWkb = rs.getBytes(8);
				group.add(rs.getLong(2), rs.getString(3), rs.getString(5), rs.getString(6), kind,
						Wkb.read(rs.getBytes(7)), (correctedWkb != null) ? Wkb.read(correctedWkb) : null);
			}
			if (group != null && group.write()) {
				tiles++;
				maskPixels += group.drafted.count();
				correctedPixels += (group.corrected != null) ? group.corrected.count() : 0;
				group.manifest(csvOut, jsonOut);
			}
		}
		copy("manifest.csv", csv);
		copy("manifest.jsonl", jsonl);
		return new Summary(this.samples, this.corrected, tiles, maskPixels, correctedPixels, spoolNanos, sortNanos,
				System.nanoTime() - start);
	}

	/** The drafts that touch one tile, drawn into its masks. */
	private final class TileGroup {

		private final long key;

		private final Tile tile;

		private final TileMask drafted;

		private TileMask corrected;

		private final List<Object[]> held = new ArrayList<>();

		TileGroup(long key, Tile tile) {
			this.key = key;
			this.tile = tile;
			this.drafted = new TileMask(tile);
		}

		void add(long draftId, String sourceId, String verdict, String reason, FeatureKind kind, Geometry draft,
				Geometry fixed) {
			boolean covered = draw(this.drafted, kind, draft);
			if (fixed != null) {
				if (this.corrected == null) {
					this.corrected = new TileMask(this.tile);
				}
				covered |= draw(this.corrected, kind, fixed);
			}
			if (covered) {
				this.held.add(new Object[] { draftId, sourceId, verdict, reason });
			}
		}

		private boolean draw(TileMask mask, FeatureKind kind, Geometry geometry) {
			return (kind == FeatureKind.ROAD) ? mask.addRoad(geometry, TrainingSetWriter.this.spec.roadWidthMetres())
					: mask.addArea(geometry);
		}

		/** Writes the masks unless no draft covers a pixel of the tile. */
		boolean write() throws IOException {
			if (this.held.isEmpty()) {
				return false;
			}
			png(path("masks"), this.drafted.png());
			if (this.corrected != null) {
				png(path("corrected"), this.corrected.png());
			}
			return true;
		}

		private String path(String folder) {
			return folder + "/" + this.tile.z() + "/" + this.tile.x() + "/" + this.tile.y() + ".png";
		}

		void manifest(BufferedWriter csv, BufferedWriter jsonl) throws IOException {
			Envelope degrees = this.tile.bounds4326();
			Envelope metres = this.tile.bounds3857();
			StringBuilder ids = new StringBuilder();
			StringBuilder reasons = new StringBuilder();
			StringBuilder verdicts = new StringBuilder();
			for (Object[] d : this.held) {
				String gap = (ids.length() > 0) ? " " : "";
				ids.append(gap).append(d[0]);
				reasons.append(gap).append(d[3]);
				verdicts.append(gap).append(d[2]);
			}
			String correctedPath = (this.corrected != null) ? path("corrected") : "";
			String correctedCount = (this.corrected != null) ? String.valueOf(this.corrected.count()) : "";
			csv.write(String.join(",", String.valueOf(this.tile.z()), String.valueOf(this.tile.x()),
					String.valueOf(this.tile.y()), num(degrees.getMinX()), num(degrees.getMinY()),
					num(degrees.getMaxX()), num(degrees.getMaxY()), num(metres.getMinX()), num(metres.getMinY()),
					num(metres.getMaxX()), num(metres.getMaxY()), ids, reasons, verdicts, path("masks"),
					String.valueOf(this.drafted.count()), correctedPath, correctedCount));
			csv.write('\n');
			StringBuilder line = new StringBuilder(256);
			line.append("{\"z\":").append(this.tile.z()).append(",\"x\":").append(this.tile.x());
			line.append(",\"y\":").append(this.tile.y());
			line.append(",\"bounds_4326\":[").append(num(degrees.getMinX())).append(',');
			line.append(num(degrees.getMinY())).append(',').append(num(degrees.getMaxX())).append(',');
			line.append(num(degrees.getMaxY())).append("],\"bounds_3857\":[").append(num(metres.getMinX()));
			line.append(',').append(num(metres.getMinY())).append(',').append(num(metres.getMaxX())).append(',');
			line.append(num(metres.getMaxY())).append("],\"drafts\":[");
			for (int i = 0; i < this.held.size(); i++) {
				Object[] d = this.held.get(i);
				line.append((i > 0) ? "," : "").append("{\"id\":").append(d[0]);
				line.append(",\"source_id\":").append(quoted((String) d[1]));
				line.append(",\"verdict\":").append(quoted((String) d[2]));
				line.append(",\"reason_code\":").append(quoted((String) d[3])).append('}');
			}
			line.append("],\"mask\":").append(quoted(path("masks"))).append(",\"mask_pixels\":");
			line.append(this.drafted.count()).append(",\"corrected_mask\":");
			line.append((this.corrected != null) ? quoted(correctedPath) : "null").append(",\"corrected_pixels\":");
			line.append((this.corrected != null) ? correctedCount : "null").append("}\n");
			jsonl.write(line.toString());
		}

	}

	private String quoted(String value) {
		return (value != null) ? this.json.writeValueAsString(value) : "null";
	}

	private static String num(double value) {
		return Double.toString(value);
	}

	private JsonGenerator startCollection(String what) {
		JsonGenerator generator = this.json.createGenerator(new KeepOpen(this.zip));
		generator.writeStartObject();
		generator.writeStringProperty("type", "FeatureCollection");
		generator.writeName("assay");
		generator.writeStartObject();
		generator.writeStringProperty("contents", what);
		generator.writeStringProperty("about", this.spec.about());
		generator.writeEndObject();
		generator.writeName("features");
		generator.writeStartArray();
		return generator;
	}

	private static void endCollection(JsonGenerator generator) {
		generator.writeEndArray();
		generator.writeEndObject();
		generator.close();
	}

	private static void writeFeature(JsonGenerator out, long draftId, String sourceId, String kind, String featureClass,
			double confidence, String verdict, String reason, String decidedAt, Geometry geometry) {
		out.writeStartObject();
		out.writeStringProperty("type", "Feature");
		out.writeNumberProperty("id", draftId);
		out.writeName("geometry");
		GeoJsonGeometries.write(out, geometry);
		out.writeName("properties");
		out.writeStartObject();
		out.writeNumberProperty("draft_id", draftId);
		out.writeStringProperty("source_id", sourceId);
		out.writeStringProperty("kind", kind);
		out.writeStringProperty("class", featureClass);
		out.writeNumberProperty("confidence", confidence);
		out.writeStringProperty("verdict", verdict);
		out.writeStringProperty("reason_code", reason);
		out.writeStringProperty("decided_at", decidedAt);
		out.writeEndObject();
		out.writeEndObject();
	}

	private void png(String name, byte[] bytes) throws IOException {
		ZipEntry entry = new ZipEntry(name);
		// PNG is compressed already: stored, with its size and checksum up front
		CRC32 crc = new CRC32();
		crc.update(bytes);
		entry.setMethod(ZipEntry.STORED);
		entry.setSize(bytes.length);
		entry.setCompressedSize(bytes.length);
		entry.setCrc(crc.getValue());
		this.zip.putNextEntry(entry);
		this.zip.write(bytes);
		this.zip.closeEntry();
	}

	private void text(String name, String content) throws IOException {
		this.zip.putNextEntry(new ZipEntry(name));
		this.zip.write(content.getBytes(StandardCharsets.UTF_8));
		this.zip.closeEntry();
	}

	private void copy(String name, Path file) throws IOException {
		this.zip.putNextEntry(new ZipEntry(name));
		Files.copy(file, this.zip);
		this.zip.closeEntry();
	}

	private String readme() {
		int z = this.spec.zoom();
		return this.spec.about() + "\n\n" + "Contents\n"
				+ "- drafts.geojson: each draft as the model drafted it (RFC 7946, WGS84), with its final verdict"
				+ " (REJECT, or AMEND for a corrected example) and reason code.\n"
				+ "- corrected.geojson: the amended drafts as the validators corrected them, same ids.\n" + "- masks/"
				+ z + "/{x}/{y}.png: WebMercatorQuad tiles (OGC 17-083r2) at zoom " + z
				+ ", 256 x 256, one 8-bit band: 255 where a drafted geometry lies, 0 elsewhere. Roads are buffered"
				+ " to " + this.spec.roadWidthMetres() + " m on the ground; buildings are their outlines filled."
				+ " A pixel is marked when its centre lies inside.\n" + "- corrected/" + z
				+ "/{x}/{y}.png: the same for the corrected geometries, on tiles that hold an" + " amended draft.\n"
				+ "- manifest.csv, manifest.jsonl: one row per tile: z, x, y (x from the west, y from the north),"
				+ " bounds in EPSG:4326 (west, south, east, north) and EPSG:3857 (min_x, min_y, max_x, max_y),"
				+ " the drafts that mark pixels in it with their reason codes and verdicts (space-separated and"
				+ " in the same order in the CSV), and the marked pixels of each mask. Fetch the imagery for"
				+ " a tile from the same z/x/y.\n";
	}

	private void deleteFolder() {
		try (Stream<Path> files = Files.walk(this.folder)) {
			files.sorted(Comparator.reverseOrder()).forEach((p) -> {
				try {
					Files.deleteIfExists(p);
				}
				catch (IOException ex) {
					throw new UncheckedIOException(ex);
				}
			});
		}
		catch (IOException | UncheckedIOException ex) {
			// a temporary folder; the system cleans up what is left
		}
	}

	/** Keeps the zip open when a JSON generator closes. */
	private static final class KeepOpen extends FilterOutputStream {

		KeepOpen(OutputStream out) {
			super(out);
		}

		@Override
		public void write(byte[] b, int off, int len) throws IOException {
			this.out.write(b, off, len);
		}

		@Override
		public void close() throws IOException {
			flush();
		}

	}

}
