package org.assay.export;

import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.PreparedStatement;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.List;

import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.MultiLineString;
import org.locationtech.jts.geom.MultiPolygon;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.io.ByteOrderValues;
import org.locationtech.jts.io.WKBWriter;

/**
 * Writes a GeoPackage (OGC 12-128r18, version 1.4) with SQLite: the core tables
 * ({@code gpkg_spatial_ref_sys}, {@code gpkg_contents}, {@code gpkg_geometry_columns}),
 * feature tables in EPSG:4326 whose geometries are GeoPackage binary (the "GP" header
 * with the envelope, then ISO WKB, little-endian), the R-tree spatial index extension
 * ({@code gpkg_rtree_index}, the spec's triggers included), and the metadata extension
 * holding a note for readers. Rows go in through one transaction with journaling off: a
 * new file written once.
 */
final class GeoPackageWriter implements AutoCloseable {

	/** "GPKG" (spec 1.1.1.1.1). */
	private static final int APPLICATION_ID = 0x47504B47;

	/** Version 1.4.0 (spec 1.1.1.1.1). */
	private static final int USER_VERSION = 10400;

	private static final int SRS = 4326;

	private static final int BATCH = 1000;

	/** A column of a feature table: SQL name and GeoPackage data type. */
	record Column(String name, String type) {
	}

	private final Connection connection;

	private final GeometryFactory factory = new GeometryFactory();

	private final WKBWriter wkb = new WKBWriter(2, ByteOrderValues.LITTLE_ENDIAN);

	private PreparedStatement insert;

	private PreparedStatement index;

	private String table;

	private Envelope extent;

	private long rows;

	GeoPackageWriter(Path file) throws SQLException {
		this.connection = DriverManager.getConnection("jdbc:sqlite:" + file.toAbsolutePath());
		try (Statement s = this.connection.createStatement()) {
			s.execute("pragma application_id = " + APPLICATION_ID);
			s.execute("pragma user_version = " + USER_VERSION);
			s.execute("pragma journal_mode = off");
			s.execute("pragma synchronous = off");
		}
		this.connection.setAutoCommit(false);
		try (Statement s = this.connection.createStatement()) {
			s.execute("create table gpkg_spatial_ref_sys (srs_name text not null, srs_id integer primary key,"
					+ " organization text not null, organization_coordsys_id integer not null,"
					+ " definition text not null, description text)");
			s.execute("insert into gpkg_spatial_ref_sys values ('Undefined cartesian SRS', -1, 'NONE', -1,"
					+ " 'undefined', 'undefined cartesian coordinate reference system')");
			s.execute("insert into gpkg_spatial_ref_sys values ('Undefined geographic SRS', 0, 'NONE', 0,"
					+ " 'undefined', 'undefined geographic coordinate reference system')");
			s.execute("insert into gpkg_spatial_ref_sys values ('WGS 84 geodetic', 4326, 'EPSG', 4326, '" + WGS84_WKT
					+ "', 'longitude/latitude coordinates in decimal degrees on the WGS 84 spheroid')");
			s.execute("create table gpkg_contents (table_name text not null primary key, data_type text not null,"
					+ " identifier text unique, description text default '',"
					+ " last_change datetime not null default (strftime('%Y-%m-%dT%H:%M:%fZ','now')),"
					+ " min_x double, min_y double, max_x double, max_y double, srs_id integer,"
					+ " constraint fk_gc_r_srs_id foreign key (srs_id) references gpkg_spatial_ref_sys(srs_id))");
			s.execute("create table gpkg_geometry_columns (table_name text not null, column_name text not null,"
					+ " geometry_type_name text not null, srs_id integer not null, z tinyint not null,"
					+ " m tinyint not null, constraint pk_geom_cols primary key (table_name, column_name),"
					+ " constraint fk_gc_tn foreign key (table_name) references gpkg_contents(table_name),"
					+ " constraint fk_gc_srs foreign key (srs_id) references gpkg_spatial_ref_sys (srs_id))");
			s.execute("create table gpkg_extensions (table_name text, column_name text, extension_name text not null,"
					+ " definition text not null, scope text not null,"
					+ " constraint ge_tce unique (table_name, column_name, extension_name))");
		}
	}

	/**
	 * Starts a feature table.
	 * @param name the table's name
	 * @param geometryType {@code MULTILINESTRING} or {@code MULTIPOLYGON}
	 * @param description what it holds
	 * @param columns its attribute columns after {@code fid} and {@code geom}
	 */
	void startTable(String name, String geometryType, String description, List<Column> columns) throws SQLException {
		finishTable();
		StringBuilder create = new StringBuilder(
				"create table \"" + name + "\" (fid integer primary key autoincrement not null, geom " + geometryType);
		StringBuilder insertSql = new StringBuilder("insert into \"" + name + "\" (fid, geom");
		StringBuilder marks = new StringBuilder("?, ?");
		for (Column column : columns) {
			create.append(", \"").append(column.name()).append("\" ").append(column.type());
			insertSql.append(", \"").append(column.name()).append('"');
			marks.append(", ?");
		}
		try (Statement s = this.connection.createStatement()) {
			s.execute(create.append(')').toString());
			try (PreparedStatement contents = this.connection
				.prepareStatement("insert into gpkg_contents (table_name, data_type, identifier, description,"
						+ " last_change, srs_id) values (?, 'features', ?, ?, ?, ?)")) {
				contents.setString(1, name);
				contents.setString(2, name);
				contents.setString(3, description);
				contents.setString(4, Instant.now().truncatedTo(ChronoUnit.MILLIS).toString());
				contents.setInt(5, SRS);
				contents.executeUpdate();
			}
			s.execute("insert into gpkg_geometry_columns values ('" + name + "', 'geom', '" + geometryType + "', " + SRS
					+ ", 0, 0)");
			s.execute("create virtual table \"rtree_" + name + "_geom\" using rtree(id, minx, maxx, miny, maxy)");
			s.execute("insert into gpkg_extensions values ('" + name + "', 'geom', 'gpkg_rtree_index',"
					+ " 'http://www.geopackage.org/spec120/#extension_rtree', 'write-only')");
		}
		this.insert = this.connection
			.prepareStatement(insertSql.append(") values (").append(marks).append(')').toString());
		this.index = this.connection.prepareStatement(
				"insert into \"rtree_" + name + "_geom\" (id, minx, maxx, miny, maxy) values (?, ?, ?, ?, ?)");
		this.table = name;
		this.extent = new Envelope();
		this.rows = 0;
	}

	/**
	 * Adds a feature to the current table.
	 * @param geometry the geometry, made multi where the table's type is
	 * @param values the attribute values in the order of the columns
	 */
	void add(Geometry geometry, Object... values) throws SQLException {
		Geometry multi = multi(geometry);
		Envelope box = multi.getEnvelopeInternal();
		long fid = this.rows + 1;
		this.insert.setLong(1, fid);
		this.insert.setBytes(2, binary(multi, box));
		for (int i = 0; i < values.length; i++) {
			this.insert.setObject(i + 3, values[i]);
		}
		this.insert.addBatch();
		this.index.setLong(1, fid);
		this.index.setDouble(2, box.getMinX());
		this.index.setDouble(3, box.getMaxX());
		this.index.setDouble(4, box.getMinY());
		this.index.setDouble(5, box.getMaxY());
		this.index.addBatch();
		this.extent.expandToInclude(box);
		this.rows++;
		if (this.rows % BATCH == 0) {
			this.insert.executeBatch();
			this.index.executeBatch();
		}
	}

	/**
	 * Adds a text note for readers as dataset metadata (the metadata extension).
	 */
	void note(String text) throws SQLException {
		try (Statement s = this.connection.createStatement()) {
			s.execute("create table if not exists gpkg_metadata (id integer constraint m_pk primary key asc not null,"
					+ " md_scope text not null default 'dataset', md_standard_uri text not null,"
					+ " mime_type text not null default 'text/xml', metadata text not null default '')");
			s.execute("create table if not exists gpkg_metadata_reference (reference_scope text not null,"
					+ " table_name text, column_name text, row_id_value integer,"
					+ " timestamp datetime not null default (strftime('%Y-%m-%dT%H:%M:%fZ','now')),"
					+ " md_file_id integer not null, md_parent_id integer,"
					+ " constraint crmr_mfi_fk foreign key (md_file_id) references gpkg_metadata(id),"
					+ " constraint crmr_mpi_fk foreign key (md_parent_id) references gpkg_metadata(id))");
			s.execute("insert or ignore into gpkg_extensions values ('gpkg_metadata', null, 'gpkg_metadata',"
					+ " 'http://www.geopackage.org/spec120/#extension_metadata', 'read-write')");
			s.execute("insert or ignore into gpkg_extensions values ('gpkg_metadata_reference', null,"
					+ " 'gpkg_metadata', 'http://www.geopackage.org/spec120/#extension_metadata', 'read-write')");
		}
		try (PreparedStatement metadata = this.connection.prepareStatement("insert into gpkg_metadata (md_scope,"
				+ " md_standard_uri, mime_type, metadata) values ('dataset', 'http://www.ietf.org/rfc/rfc2046.txt',"
				+ " 'text/plain', ?)", Statement.RETURN_GENERATED_KEYS)) {
			metadata.setString(1, text);
			metadata.executeUpdate();
			long id;
			try (var keys = metadata.getGeneratedKeys()) {
				keys.next();
				id = keys.getLong(1);
			}
			try (Statement s = this.connection.createStatement()) {
				s.execute("insert into gpkg_metadata_reference (reference_scope, md_file_id) values ('geopackage', "
						+ id + ")");
			}
		}
	}

	/** The rows written to the current table so far. */
	long rows() {
		return this.rows;
	}

	private void finishTable() throws SQLException {
		if (this.table == null) {
			return;
		}
		this.insert.executeBatch();
		this.index.executeBatch();
		this.insert.close();
		this.index.close();
		try (PreparedStatement contents = this.connection.prepareStatement(
				"update gpkg_contents set min_x = ?, min_y = ?, max_x = ?, max_y = ? where table_name = ?")) {
			boolean empty = this.extent.isNull();
			contents.setObject(1, empty ? null : this.extent.getMinX());
			contents.setObject(2, empty ? null : this.extent.getMinY());
			contents.setObject(3, empty ? null : this.extent.getMaxX());
			contents.setObject(4, empty ? null : this.extent.getMaxY());
			contents.setString(5, this.table);
			contents.executeUpdate();
		}
		rtreeTriggers(this.table);
		this.table = null;
	}

	/** The triggers of the R-tree extension (spec F.3), which keep the index in step. */
	private void rtreeTriggers(String t) throws SQLException {
		String r = "\"rtree_" + t + "_geom\"";
		String q = "\"" + t + "\"";
		String box = "ST_MinX(NEW.geom), ST_MaxX(NEW.geom), ST_MinY(NEW.geom), ST_MaxY(NEW.geom)";
		try (Statement s = this.connection.createStatement()) {
			s.execute("create trigger \"rtree_" + t + "_geom_insert\" after insert on " + q
					+ " when (new.geom not null and not ST_IsEmpty(NEW.geom)) begin insert or replace into " + r
					+ " values (NEW.fid, " + box + "); end");
			s.execute("create trigger \"rtree_" + t + "_geom_update6\" after update of geom on " + q
					+ " when OLD.fid = NEW.fid and (NEW.geom notnull and not ST_IsEmpty(NEW.geom)) begin update " + r
					+ " set minx = ST_MinX(NEW.geom), maxx = ST_MaxX(NEW.geom), miny = ST_MinY(NEW.geom),"
					+ " maxy = ST_MaxY(NEW.geom) where id = NEW.fid; end");
			s.execute("create trigger \"rtree_" + t + "_geom_update7\" after update of geom on " + q
					+ " when OLD.fid = NEW.fid and (NEW.geom isnull or ST_IsEmpty(NEW.geom)) begin delete from " + r
					+ " where id = OLD.fid; end");
			s.execute("create trigger \"rtree_" + t + "_geom_update3\" after update on " + q
					+ " when OLD.fid != NEW.fid and (NEW.geom notnull and not ST_IsEmpty(NEW.geom)) begin delete from "
					+ r + " where id = OLD.fid; insert or replace into " + r + " values (NEW.fid, " + box + "); end");
			s.execute("create trigger \"rtree_" + t + "_geom_update4\" after update on " + q
					+ " when OLD.fid != NEW.fid and (NEW.geom isnull or ST_IsEmpty(NEW.geom)) begin delete from " + r
					+ " where id in (OLD.fid, NEW.fid); end");
			s.execute("create trigger \"rtree_" + t + "_geom_delete\" after delete on " + q
					+ " when old.geom not null begin delete from " + r + " where id = OLD.fid; end");
		}
	}

	private Geometry multi(Geometry geometry) {
		if (geometry instanceof LineString line) {
			return this.factory.createMultiLineString(new LineString[] { line });
		}
		if (geometry instanceof Polygon polygon) {
			return this.factory.createMultiPolygon(new Polygon[] { polygon });
		}
		if (geometry instanceof MultiLineString || geometry instanceof MultiPolygon) {
			return geometry;
		}
		throw new IllegalArgumentException("Not a road or building geometry: " + geometry.getGeometryType());
	}

	/** GeoPackage binary (spec 2.1.3): header with the XY envelope, then the WKB. */
	private byte[] binary(Geometry geometry, Envelope box) {
		byte[] body = this.wkb.write(geometry);
		ByteBuffer out = ByteBuffer.allocate(8 + 32 + body.length).order(ByteOrder.LITTLE_ENDIAN);
		out.put((byte) 'G').put((byte) 'P').put((byte) 0);
		// flags: standard binary, envelope [minx, maxx, miny, maxy] (code 1),
		// little-endian
		out.put((byte) 0b0000_0011);
		out.putInt(SRS);
		out.putDouble(box.getMinX()).putDouble(box.getMaxX()).putDouble(box.getMinY()).putDouble(box.getMaxY());
		out.put(body);
		return out.array();
	}

	@Override
	public void close() throws SQLException {
		try {
			finishTable();
			this.connection.commit();
		}
		finally {
			this.connection.close();
		}
	}

	/** The OGC WKT of EPSG:4326 as the GeoPackage specification's table 21 gives it. */
	private static final String WGS84_WKT = "GEOGCS[\"WGS 84\",DATUM[\"WGS_1984\",SPHEROID[\"WGS 84\",6378137,298.257223563,"
			+ "AUTHORITY[\"EPSG\",\"7030\"]],AUTHORITY[\"EPSG\",\"6326\"]],PRIMEM[\"Greenwich\",0,AUTHORITY[\"EPSG\",\"8901\"]],"
			+ "UNIT[\"degree\",0.0174532925199433,AUTHORITY[\"EPSG\",\"9122\"]],AUTHORITY[\"EPSG\",\"4326\"]]";

}
