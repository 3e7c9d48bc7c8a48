// The map's feature layers: the reference layer, the cell's drafts drawn by state, and the
// current draft drawn on its own (halo, casing, line) above the others.

import { currentStyles, draftCasing, draftLine, flagMarker, hidden, referenceStyle, stateOf } from './styles.js';

const KIND_NAMES = { road: 'Road', building: 'Building' };
export const kindName = (kind) => KIND_NAMES[kind] || kind || 'Feature';

/** The geometry to draw: an amended draft shows its amended shape. */
export const shownGeometry = (feature) => feature.properties.verdict?.geometry || feature.geometry;

const asFeature = (feature, geometry = shownGeometry(feature)) => ({ type: 'Feature', id: feature.id, properties: feature.properties, geometry });

const DEPTH = { LineString: 0, Polygon: 1, MultiLineString: 1, MultiPolygon: 2 };

/** Leaflet lat/lngs for a GeoJSON geometry (no points). */
export function latLngsOf(geometry) {
  return L.GeoJSON.coordsToLatLngs(geometry.coordinates, DEPTH[geometry.type]);
}

export function boundsOf(geometry) {
  return L.geoJSON(geometry).getBounds();
}

const pointToLayer = (feature, latlng) => L.circleMarker(latlng, { radius: 6 });

// A GeoJSON group whose `add(feature)` returns the layer it made.
function group(map, pane, style, extra = {}) {
  let made = null;
  const onEachFeature = (feature, layer) => {
    made = layer;
  };
  const g = L.geoJSON(null, { pane, style, pointToLayer, onEachFeature, ...extra }).addTo(map);
  g.add = (feature) => {
    g.addData(feature);
    return made;
  };
  return g;
}

/**
 * Creates the layers on `map`. `onPick(id)` is called when a draft is clicked; `describe(feature)`
 * gives a draft's tooltip. Returns the operations the review loop needs.
 */
export function createLayers(map, onPick, describe) {
  const refCasing = group(map, 'reference', (f) => referenceStyle('casing', f), { interactive: false });
  // snapIgnore: false makes a layer a snap target for the amend tool (amend.js opts layers in)
  const refLine = group(map, 'reference', (f) => referenceStyle('line', f), { interactive: false, snapIgnore: false });
  const casings = group(map, 'draftCasing', draftCasing, { interactive: false });
  const lines = group(map, 'draft', (f) => draftLine(stateOf(f), f.properties.kind), { snapIgnore: false });
  const current = ['halo', 'currentCasing', 'current'].map((pane) => group(map, pane, () => ({}), { interactive: false }));
  const flagPoints = L.layerGroup().addTo(map);
  const byId = new Map(); // draft id -> {casing, line}
  let currentId = null;

  function draw(feature) {
    const shown = asFeature(feature);
    const entry = { casing: casings.add(shown), line: lines.add(shown) };
    entry.line.bindTooltip(describe(feature), { sticky: true, direction: 'top', className: 'draft-tip' });
    // Off the Tab order: n and p walk the drafts; a Tab stop per draft would bury the panel.
    entry.line.getElement()?.setAttribute('tabindex', '-1');
    entry.line.on('click', (e) => {
      L.DomEvent.stop(e);
      onPick(feature.id);
    });
    if (feature.id === currentId) {
      [entry.casing, entry.line].forEach((l) => l.setStyle(hidden));
      entry.line.options.snapIgnore = true; // never snap a draft to its own old shape
    }
    byId.set(feature.id, entry);
  }

  function erase(id) {
    const entry = byId.get(id);
    if (!entry) return;
    casings.removeLayer(entry.casing);
    lines.removeLayer(entry.line);
    byId.delete(id);
  }

  function drawCurrent(feature, geometry) {
    const styles = currentStyles(stateOf(feature), feature.properties.kind);
    const shown = asFeature(feature, geometry);
    ['halo', 'casing', 'line'].forEach((part, i) => {
      current[i].clearLayers();
      current[i].options.style = () => styles[part];
      current[i].addData(shown);
    });
    flagPoints.clearLayers();
    for (const flag of feature.properties.flags || []) {
      if (!Array.isArray(flag.point)) continue;
      L.circleMarker([flag.point[1], flag.point[0]], { ...flagMarker, pane: 'flags' })
        .bindTooltip(flag.label || flag.code, { direction: 'top', className: 'draft-tip' })
        .addTo(flagPoints);
    }
  }

  return {
    setReference(collection) {
      refCasing.clearLayers().addData(collection);
      refLine.clearLayers().addData(collection);
    },
    setDrafts(features) {
      features.forEach(draw);
    },
    /** Redraws a draft after its verdict changed. */
    update(feature) {
      erase(feature.id);
      draw(feature);
      if (feature.id === currentId) drawCurrent(feature, shownGeometry(feature));
    },
    setCurrent(feature) {
      const before = byId.get(currentId);
      currentId = feature.id;
      if (before) {
        before.line.options.snapIgnore = false;
        before.casing.setStyle(draftCasing());
        before.line.setStyle(draftLine(stateOf(before.line.feature), before.line.feature.properties.kind));
      }
      const entry = byId.get(feature.id);
      if (entry) {
        [entry.casing, entry.line].forEach((l) => l.setStyle(hidden));
        entry.line.options.snapIgnore = true;
      }
      drawCurrent(feature, shownGeometry(feature));
    },
    /** Redraws the current draft with a geometry being edited. */
    setCurrentGeometry(geometry) {
      current.forEach((g) => g.eachLayer((l) => l.setLatLngs(latLngsOf(geometry))));
    },
    /** The [lng, lat] ends of the roads other than draft `exceptId`: drafts as shown, and the reference layer. */
    roadEnds(exceptId) {
      const ends = [];
      const add = (geometry) => {
        if (geometry?.type === 'LineString') ends.push(geometry.coordinates[0], geometry.coordinates.at(-1));
        else if (geometry?.type === 'MultiLineString') geometry.coordinates.forEach((c) => ends.push(c[0], c.at(-1)));
      };
      lines.eachLayer((l) => l.feature.id !== exceptId && add(shownGeometry(l.feature)));
      refLine.eachLayer((l) => add(l.feature.geometry));
      return ends;
    },
    showDrafts(visible) {
      [casings, lines].forEach((g) => (visible ? g.addTo(map) : g.remove()));
    },
    showReference(visible) {
      [refCasing, refLine].forEach((g) => (visible ? g.addTo(map) : g.remove()));
    },
  };
}
