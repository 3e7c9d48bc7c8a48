// Amending a draft's shape with leaflet-geoman (vendored, see vendor/leaflet-geoman/README.md):
// drag a vertex, click the small mid-point handle to add one, right-click a vertex (or focus it
// and press Delete) to remove it. Dragged vertices snap to the ends and lines of other roads
// within a few pixels; j joins the line end nearest a road end onto it; s splits a line at the
// focused vertex. A focused vertex moves with the arrow keys (Shift for bigger steps).

const EDITABLE = ['LineString', 'Polygon', 'MultiLineString', 'MultiPolygon'];
const DECIMALS = 7; // about 1 cm; RFC 7946 says 6 are usually enough
const SNAP_PX = 10; // how close a dragged vertex comes to a road before it snaps
const JOIN_PX = 24; // how close a line end must be to a road end for j to join them
const EDIT_STYLE = { color: '#ffffff', weight: 2, opacity: 0.95, dashArray: '2 5', fill: false, pmIgnore: false, snapIgnore: true };
const STEPS = { ArrowLeft: [-1, 0], ArrowRight: [1, 0], ArrowUp: [0, -1], ArrowDown: [0, 1] };

export const canAmend = (geometry) => Boolean(geometry) && EDITABLE.includes(geometry.type);

let configured = false;
function configure() {
  if (configured) return;
  L.PM.setOptIn(true); // only the shape being amended is editable; snap targets say so themselves
  configured = true;
}

const isLine = (geometry) => geometry.type === 'LineString' || geometry.type === 'MultiLineString';
const parts = (geometry) => (geometry.type === 'LineString' ? [geometry.coordinates] : geometry.coordinates);
const asLines = (list) => (list.length === 1 ? { type: 'LineString', coordinates: list[0] } : { type: 'MultiLineString', coordinates: list });

function layerFor(geometry) {
  const depth = { LineString: 0, MultiLineString: 1, Polygon: 1, MultiPolygon: 2 }[geometry.type];
  const latlngs = L.GeoJSON.coordsToLatLngs(geometry.coordinates, depth);
  return isLine(geometry) ? L.polyline(latlngs, EDIT_STYLE) : L.polygon(latlngs, EDIT_STYLE);
}

// The coordinate list of a GeoJSON shape that holds a vertex, and the vertex's index in it
// (geoman's marker paths leave out a ring's closing position, so the indices agree).
function listAt(g, path) {
  if (g.type === 'LineString') return [g.coordinates, path[0]];
  if (g.type === 'MultiLineString' || g.type === 'Polygon') return [g.coordinates[path[0]], path[1]];
  return [g.coordinates[path[0]][path[1]], path[2]];
}

// The vertex markers of the layer being edited, each with its part and position in the part.
// geoman keeps them in `layer.pm._markers`, nested like the coordinates: not its public API,
// checked against 2.20.2 (AmendToolBrowserTests fails if a new version changes it).
function vertexMarkers(markers, path = []) {
  if (!Array.isArray(markers)) return [];
  return markers.flatMap((m, i) => (Array.isArray(m) ? vertexMarkers(m, [...path, i]) : [{ marker: m, path: [...path, i] }]));
}

/**
 * Starts amending a copy of `geometry` on `map`. `onChange(geometry)` runs on every change;
 * `roadEnds()` gives [lng, lat] ends of the other roads (drafts and reference) to join to;
 * `say(text, kind)` reports what a key did. Returns {geometry(), stop(), join(), split()}.
 */
export function startAmend(map, geometry, onChange, { roadEnds = () => [], say = () => {} } = {}) {
  configure();
  let shape = structuredClone(geometry);
  let layer = null;
  let focused = null; // {marker} of the vertex that last had the keyboard focus

  const read = () => {
    const g = layer.toGeoJSON(DECIMALS).geometry;
    shape = g;
    return g;
  };
  const changed = () => onChange(read());

  // where a vertex marker is now: adding a vertex shifts the later ones' positions
  const pathOf = (marker) => vertexMarkers(layer.pm._markers).find((v) => v.marker === marker)?.path || null;

  function label() {
    const all = vertexMarkers(layer.pm._markers);
    const tail = isLine(shape) ? ', s splits the line here' : '';
    all.forEach(({ marker }, n) => {
      const icon = marker.getElement();
      if (!icon) return;
      icon.setAttribute('aria-label', `Vertex ${n + 1} of ${all.length}. Arrow keys move it, Delete removes it${tail}.`);
      if (icon.dataset.wired) return;
      icon.dataset.wired = 'true';
      icon.addEventListener('focus', () => {
        focused = { marker };
      });
      icon.addEventListener('keydown', (e) => onVertexKey(e, marker));
    });
  }

  function mount(next) {
    if (layer) {
      layer.pm.disable();
      layer.remove();
    }
    shape = next;
    layer = layerFor(next).addTo(map);
    layer.pm.enable({ snappable: true, snapDistance: SNAP_PX, allowSelfIntersection: true, draggable: false, removeVertexOn: 'contextmenu' });
    layer.on('pm:change pm:vertexadded pm:vertexremoved pm:markerdragend', () => {
      changed();
      label();
    });
    label();
    onChange(structuredClone(shape));
  }

  function refocus(path) {
    const found = vertexMarkers(layer.pm._markers).find((v) => v.path.join() === path.join());
    found?.marker.getElement()?.focus({ preventScroll: true });
  }

  function remove(path) {
    const next = structuredClone(read());
    const [list, i] = listAt(next, path);
    const ring = !isLine(next);
    if (list.length - (ring ? 1 : 0) <= (ring ? 3 : 2)) {
      return say(ring ? 'A shape keeps at least three corners.' : 'A line keeps at least two vertices.', 'error');
    }
    list.splice(i, 1);
    if (ring && i === 0) list[list.length - 1] = list[0];
    mount(next);
    say('Vertex removed.');
    return refocus(path.map((p, k) => (k === path.length - 1 ? Math.max(0, p - 1) : p)));
  }

  /** Splits a line in two at the focused vertex; a split part keeps the vertex at its end. */
  function split() {
    if (!isLine(shape)) return say('Only a line can be split.', 'error');
    const path = focused && pathOf(focused.marker);
    if (!path) return say('Focus a vertex first (Tab to it), then press s.', 'error');
    read();
    const list = parts(shape).map((p) => p.slice());
    const part = shape.type === 'LineString' ? 0 : path[0];
    const i = path[path.length - 1];
    const coords = list[part];
    if (i <= 0 || i >= coords.length - 1) return say('A line splits at an inner vertex, not at its end.', 'error');
    list.splice(part, 1, coords.slice(0, i + 1), coords.slice(i));
    mount(asLines(list));
    say(`Split into ${list.length} parts.`, 'ok');
    return undefined;
  }

  /** Moves the line end nearest to a road end onto that end, if it is within JOIN_PX pixels. */
  function join() {
    if (!isLine(shape)) return say('Only a line end can be joined to a road.', 'error');
    read();
    const list = parts(shape).map((p) => p.slice());
    const px = (p) => map.latLngToContainerPoint([p[1], p[0]]);
    let best = null;
    list.forEach((coords, part) => {
      [0, coords.length - 1].forEach((i) => {
        const end = px(coords[i]);
        for (const target of roadEnds()) {
          const d = end.distanceTo(px(target));
          if (d > 0 && (!best || d < best.d)) best = { d, part, i, target };
        }
      });
    });
    if (!best || best.d > JOIN_PX) return say(`No road end within ${JOIN_PX} pixels of a line end.`, 'error');
    list[best.part][best.i] = [...best.target];
    mount(asLines(list));
    say('Joined the line end to the road end.', 'ok');
    return undefined;
  }

  function onVertexKey(event, marker) {
    if (event.key === 'Delete') {
      event.preventDefault();
      event.stopPropagation();
      const path = pathOf(marker);
      if (path) remove(path);
      return;
    }
    if (event.key === 's' && !event.ctrlKey && !event.metaKey) {
      event.preventDefault();
      event.stopPropagation();
      focused = { marker };
      split();
      return;
    }
    const step = STEPS[event.key];
    if (!step) return;
    event.preventDefault();
    event.stopPropagation(); // the map would pan otherwise
    const size = event.shiftKey ? 10 : 2;
    const point = map.latLngToContainerPoint(marker.getLatLng()).add([step[0] * size, step[1] * size]);
    marker.setLatLng(map.containerPointToLatLng(point)); // geoman follows the marker's move
    changed();
  }

  mount(shape);
  return {
    geometry: () => structuredClone(read()),
    stop: () => {
      layer.pm.disable();
      layer.remove();
    },
    split,
    join,
  };
}
