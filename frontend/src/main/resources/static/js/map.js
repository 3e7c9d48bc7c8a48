// The Leaflet map: panes in drawing order, the base layer (the batch's imagery, or a plain
// background with a notice), and the shade outside the cell. Leaflet is the global `L`.

import { el } from './dom.js';
import { outside } from './styles.js';

// Bottom to top. Leaflet's own overlay pane is 400 and its marker pane (vertex handles) 600.
const PANES = ['outside', 'reference', 'draftCasing', 'draft', 'halo', 'currentCasing', 'current', 'flags'];

// Most XYZ imagery stops at 19 or 20; beyond that tiles are enlarged rather than missing.
const IMAGERY_NATIVE_ZOOM = 19;

const cellBounds = ([w, s, e, n]) => L.latLngBounds([s, w], [n, e]);

function addImagery(map, template, wrap) {
  let host = '';
  try {
    host = new URL(template.replace(/\{[^}]*\}/g, '0')).host;
  } catch {
    /* a template that is not a URL: leave the attribution without a host */
  }
  const tiles = L.tileLayer(template, {
    maxZoom: 22, maxNativeZoom: IMAGERY_NATIVE_ZOOM, attribution: host ? `Imagery: ${host}` : 'Imagery',
  });
  let failures = 0;
  let warning = null;
  tiles.on('tileerror', () => {
    failures += 1;
    if (failures === 4) {
      warning = notice('Some imagery tiles could not be loaded.');
      wrap.append(warning);
    }
  });
  // tiles that failed while the connection was lost are fetched again when it is back
  window.addEventListener('online', () => {
    if (failures === 0) return;
    failures = 0;
    warning?.remove();
    warning = null;
    tiles.redraw();
  });
  tiles.addTo(map);
  return tiles;
}

const imagery = new WeakMap(); // map -> {tiles, container}

/** Sets the imagery's opacity (0..1); returns false when the map has no imagery. */
export function setImageryOpacity(map, opacity) {
  const entry = imagery.get(map);
  if (!entry) return false;
  entry.tiles.setOpacity(opacity);
  return true;
}

/** Shows a plain background instead of the imagery (to compare), or the imagery again. */
export function showPlainBackground(map, plain) {
  const entry = imagery.get(map);
  if (!entry) return false;
  if (plain) entry.tiles.remove();
  else entry.tiles.addTo(map);
  entry.container.classList.toggle('map-plain', plain);
  return true;
}

function notice(text) {
  return el('p', { className: 'map-notice', role: 'status' }, text);
}

/**
 * Creates the map in `container` (inside a positioned wrapper) for a cell of a batch, and
 * shows the cell. Returns the Leaflet map.
 */
export function createMap(container, { imageryUrl, cellBbox }) {
  const map = L.map(container, { zoomSnap: 0.5, maxZoom: 22, keyboardPanDelta: 120 });
  map.attributionControl.setPrefix('<a href="https://leafletjs.com">Leaflet</a>');
  PANES.forEach((name, i) => {
    map.createPane(name).style.zIndex = String(380 + i * 10);
  });
  const wrap = container.parentElement;
  if (imageryUrl) {
    imagery.set(map, { tiles: addImagery(map, imageryUrl, wrap), container });
  } else {
    container.classList.add('map-plain');
    wrap.append(notice('This batch has no imagery'));
  }
  const world = [[-90, -360], [-90, 360], [90, 360], [90, -360]];
  const cell = cellBounds(cellBbox);
  const hole = [cell.getSouthWest(), cell.getNorthWest(), cell.getNorthEast(), cell.getSouthEast()];
  L.polygon([world, hole], { ...outside, pane: 'outside' }).addTo(map);
  showCell(map, cellBbox);
  container.setAttribute('aria-label', 'Map of the cell. Arrow keys pan, plus and minus zoom.');
  return map;
}

/** Moves the view to the cell, widened to take in `alsoBounds` (a draft that reaches outside). */
export function showCell(map, cellBbox, alsoBounds = null) {
  const bounds = cellBounds(cellBbox);
  if (alsoBounds) bounds.extend(alsoBounds);
  map.fitBounds(bounds, { padding: [24, 24], maxZoom: 19, animate: false });
}
