package org.assay.demo;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.locationtech.jts.geom.Geometry;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * The default demo scenario, its two files and the files parsed back with Jackson's tree
 * model, generated once per test run and shared by the demo tests.
 */
final class DemoFixture {

	private static DemoFixture instance;

	final DemoScenario scenario;

	final byte[] draftBytes;

	final byte[] referenceBytes;

	/** The written draft features, in file order. */
	final List<JsonNode> drafts;

	/** The written reference geometries by id. */
	final Map<String, Geometry> referenceGeometries = new HashMap<>();

	private DemoFixture() {
		this.scenario = DemoScenario.generate();
		this.draftBytes = bytes(this.scenario::writeDrafts);
		this.referenceBytes = bytes(this.scenario::writeReference);
		JsonMapper json = JsonMapper.builder().build();
		this.drafts = new ArrayList<>(json.readTree(this.draftBytes).get("features").values());
		for (JsonNode feature : json.readTree(this.referenceBytes).get("features").values()) {
			this.referenceGeometries.put(feature.get("id").stringValue(),
					GeoJsonTestGeometries.read(feature.get("geometry")));
		}
	}

	static synchronized DemoFixture get() {
		if (instance == null) {
			instance = new DemoFixture();
		}
		return instance;
	}

	/** The geometry of a draft as written; drafts are written in id order. */
	Geometry writtenGeometry(String draftId) {
		JsonNode feature = this.drafts.get(Integer.parseInt(draftId.substring(2)) - 1);
		if (!feature.get("id").stringValue().equals(draftId)) {
			throw new IllegalStateException("Drafts are not written in id order");
		}
		return GeoJsonTestGeometries.read(feature.get("geometry"));
	}

	static byte[] bytes(Writing writing) {
		ByteArrayOutputStream out = new ByteArrayOutputStream();
		try {
			writing.writeTo(out);
		}
		catch (IOException ex) {
			throw new UncheckedIOException(ex);
		}
		return out.toByteArray();
	}

	@FunctionalInterface
	interface Writing {

		void writeTo(OutputStream out) throws IOException;

	}

}
