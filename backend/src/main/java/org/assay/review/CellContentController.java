package org.assay.review;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.assay.accounts.AccountService;
import org.assay.batches.Draft;
import org.assay.batches.DraftStore;
import org.assay.batches.ReferenceFeature;
import org.assay.geo.GeoJsonGeometries;
import org.assay.queue.CellView;
import org.assay.queue.QueueService;
import tools.jackson.databind.ObjectMapper;

import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.RestController;

/**
 * A cell's drafts with their current verdicts, and the reference layer around it, as
 * GeoJSON for the map.
 */
@RestController
class CellContentController {

	private static final int REFERENCE_LIMIT = 5000;

	/** How far around the cell reference features are shown, as a share of its size. */
	private static final double MARGIN = 0.25;

	private final QueueService queue;

	private final DraftStore drafts;

	private final VerdictService verdicts;

	private final AccountService accounts;

	private final ObjectMapper json;

	CellContentController(QueueService queue, DraftStore drafts, VerdictService verdicts, AccountService accounts,
			ObjectMapper json) {
		this.json = json;
		this.queue = queue;
		this.drafts = drafts;
		this.verdicts = verdicts;
		this.accounts = accounts;
	}

	@GetMapping(path = "/api/cells/{cellId}/drafts", produces = { "application/geo+json", "application/json" })
	Map<String, Object> drafts(@PathVariable long cellId) {
		CellView cell = this.queue.readable(this.accounts.current(), cellId);
		Map<Long, VerdictRecord> current = this.verdicts.shownInCell(cell);
		List<Map<String, Object>> features = new ArrayList<>();
		for (Draft draft : this.drafts.inCell(cellId)) {
			Map<String, Object> properties = new LinkedHashMap<>();
			properties.put("kind", draft.kind().jsonName());
			properties.put("confidence", draft.confidence());
			properties.put("class", draft.featureClass());
			properties.put("sourceId", draft.sourceId());
			properties.put("seq", draft.seq());
			properties.put("risk", Math.round(draft.risk() * 1000) / 1000.0);
			properties.put("flags", (draft.flagsJson() != null) ? this.json.readTree(draft.flagsJson()) : List.of());
			VerdictRecord verdict = current.get(draft.id());
			properties.put("verdict", (verdict != null) ? VerdictView.of(verdict, null) : null);
			features.add(feature(draft.id(), draft.geometry(), properties));
		}
		return collection(features);
	}

	@GetMapping(path = "/api/cells/{cellId}/reference", produces = { "application/geo+json", "application/json" })
	Map<String, Object> reference(@PathVariable long cellId) {
		CellView cell = this.queue.readable(this.accounts.current(), cellId);
		double[] box = cell.bbox();
		double dx = (box[2] - box[0]) * MARGIN;
		double dy = (box[3] - box[1]) * MARGIN;
		List<Map<String, Object>> features = new ArrayList<>();
		for (ReferenceFeature reference : this.drafts.referenceWithin(cell.batchId(), box[0] - dx, box[1] - dy,
				box[2] + dx, box[3] + dy, REFERENCE_LIMIT)) {
			Map<String, Object> properties = new LinkedHashMap<>();
			properties.put("kind", reference.kind().jsonName());
			properties.put("sourceId", reference.sourceId());
			features.add(feature(reference.id(), reference.geometry(), properties));
		}
		return collection(features);
	}

	private static Map<String, Object> feature(long id, org.locationtech.jts.geom.Geometry geometry,
			Map<String, Object> properties) {
		Map<String, Object> feature = new LinkedHashMap<>();
		feature.put("type", "Feature");
		feature.put("id", id);
		feature.put("geometry", GeoJsonGeometries.toMap(geometry));
		feature.put("properties", properties);
		return feature;
	}

	private static Map<String, Object> collection(List<Map<String, Object>> features) {
		Map<String, Object> collection = new LinkedHashMap<>();
		collection.put("type", "FeatureCollection");
		collection.put("features", features);
		return collection;
	}

}
