// Amending a draft's shape, the simplest way: one draggable square handle per vertex.
// A focused handle also moves with the arrow keys (Shift for bigger steps), so the shape
// can be changed without a mouse. A proper editing plugin replaces this later.

const EDITABLE = ['LineString', 'Polygon', 'MultiLineString', 'MultiPolygon'];
const DECIMALS = 7; // about 1 cm; RFC 7946 says 6 are usually enough

export const canAmend = (geometry) => Boolean(geometry) && EDITABLE.includes(geometry.type);

// The coordinate lists of a geometry: lines as they are, polygon rings with their closing position.
function paths(geometry) {
  switch (geometry.type) {
    case 'LineString': return [{ coords: geometry.coordinates, ring: false }];
    case 'MultiLineString': return geometry.coordinates.map((coords) => ({ coords, ring: false }));
    case 'Polygon': return geometry.coordinates.map((coords) => ({ coords, ring: true }));
    default: return geometry.coordinates.flatMap((polygon) => polygon.map((coords) => ({ coords, ring: true })));
  }
}

const round = (x) => Number(x.toFixed(DECIMALS));

function handleIcon() {
  return L.divIcon({ className: 'vertex-handle', iconSize: [14, 14], iconAnchor: [7, 7] });
}

/**
 * Puts handles on the vertices of a copy of `geometry`. `onChange(geometry)` is called with the
 * edited copy on every move. Returns {geometry(), stop()}.
 */
export function startAmend(map, geometry, onChange) {
  const edited = structuredClone(geometry);
  const vertices = paths(edited).flatMap(({ coords, ring }) => {
    const last = ring && coords.length > 1 ? coords.length - 1 : coords.length;
    return coords.slice(0, last).map((_, i) => ({ coords, i, closes: ring && i === 0 }));
  });
  const handles = vertices.map((v, n) => {
    const [lng, lat] = v.coords[v.i];
    const marker = L.marker([lat, lng], { icon: handleIcon(), draggable: true, keyboard: true, autoPanOnFocus: false });
    const move = () => {
      const p = marker.getLatLng();
      v.coords[v.i] = [round(p.lng), round(p.lat)];
      if (v.closes) v.coords[v.coords.length - 1] = v.coords[v.i];
      onChange(edited);
    };
    marker.on('drag', move);
    marker.on('dragend', move);
    marker.addTo(map);
    const icon = marker.getElement();
    icon.setAttribute('aria-label', `Vertex ${n + 1} of ${vertices.length}. Arrow keys move it.`);
    icon.addEventListener('keydown', (e) => nudge(e, map, marker, move));
    return marker;
  });
  return {
    geometry: () => structuredClone(edited),
    stop: () => handles.forEach((h) => h.remove()),
  };
}

const STEPS = { ArrowLeft: [-1, 0], ArrowRight: [1, 0], ArrowUp: [0, -1], ArrowDown: [0, 1] };

function nudge(event, map, marker, move) {
  const step = STEPS[event.key];
  if (!step) return;
  event.preventDefault();
  event.stopPropagation(); // the map would pan otherwise
  const size = event.shiftKey ? 10 : 2;
  const point = map.latLngToContainerPoint(marker.getLatLng()).add([step[0] * size, step[1] * size]);
  marker.setLatLng(map.containerPointToLatLng(point));
  move();
}
