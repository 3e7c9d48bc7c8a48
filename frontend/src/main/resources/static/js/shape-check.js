// Checks an amended geometry before it is sent: a shape the server would refuse, or that no one
// meant, is caught here with a message that says what is wrong. GeoJSON rules from RFC 7946
// (section 3.1: a line has two or more positions, a ring four or more and is closed); a ring
// that crosses itself is not a valid polygon (OGC Simple Features, common practice).

const finite = (p) => Array.isArray(p) && p.length >= 2 && Number.isFinite(p[0]) && Number.isFinite(p[1]);
const same = (a, b) => a[0] === b[0] && a[1] === b[1];
const distinct = (coords) => coords.filter((p, i) => i === 0 || !same(p, coords[i - 1])).length;

function lineProblem(coords, where) {
  if (!Array.isArray(coords) || !coords.every(finite)) return `${where} has a position that is not a number pair.`;
  if (distinct(coords) < 2) return `${where} needs at least two different positions.`;
  return null;
}

// Whether segments ab and cd cross or touch (orientation test); shared ends of neighbours excluded by the caller.
function orient(a, b, c) {
  const v = (b[0] - a[0]) * (c[1] - a[1]) - (b[1] - a[1]) * (c[0] - a[0]);
  return v > 0 ? 1 : v < 0 ? -1 : 0;
}

function onSegment(a, b, p) {
  return Math.min(a[0], b[0]) <= p[0] && p[0] <= Math.max(a[0], b[0])
    && Math.min(a[1], b[1]) <= p[1] && p[1] <= Math.max(a[1], b[1]);
}

function segmentsMeet(a, b, c, d) {
  const o1 = orient(a, b, c);
  const o2 = orient(a, b, d);
  const o3 = orient(c, d, a);
  const o4 = orient(c, d, b);
  if (o1 !== o2 && o3 !== o4) return true;
  return (o1 === 0 && onSegment(a, b, c)) || (o2 === 0 && onSegment(a, b, d))
    || (o3 === 0 && onSegment(c, d, a)) || (o4 === 0 && onSegment(c, d, b));
}

/** Whether a closed ring crosses or touches itself (O(n²), fine for drafted shapes). */
export function ringCrossesItself(ring) {
  const n = ring.length - 1; // segments
  for (let i = 0; i < n; i++) {
    for (let j = i + 1; j < n; j++) {
      const neighbours = j === i + 1 || (i === 0 && j === n - 1);
      if (!neighbours && segmentsMeet(ring[i], ring[i + 1], ring[j], ring[j + 1])) return true;
    }
  }
  return false;
}

function ringProblem(ring, where) {
  const line = lineProblem(ring, where);
  if (line) return line;
  if (ring.length < 4) return `${where} needs at least four positions.`;
  if (!same(ring[0], ring[ring.length - 1])) return `${where} is not closed.`;
  if (distinct(ring) < 4) return `${where} needs at least three different corners.`;
  if (ringCrossesItself(ring)) return `${where} crosses itself.`;
  return null;
}

function polygonProblem(rings, where) {
  if (!Array.isArray(rings) || rings.length === 0) return `${where} is empty.`;
  for (let r = 0; r < rings.length; r++) {
    const problem = ringProblem(rings[r], r === 0 ? `${where}'s outline` : `${where}'s hole ${r}`);
    if (problem) return problem;
  }
  return null;
}

/** What is wrong with a geometry meant to replace a draft's, or null when it can be sent. */
export function shapeProblem(geometry) {
  if (!geometry || !Array.isArray(geometry.coordinates)) return 'The shape is empty.';
  const c = geometry.coordinates;
  switch (geometry.type) {
    case 'LineString': return lineProblem(c, 'The line');
    case 'MultiLineString':
      if (c.length === 0) return 'The shape is empty.';
      return c.map((part, i) => lineProblem(part, `Part ${i + 1} of the line`)).find(Boolean) || null;
    case 'Polygon': return polygonProblem(c, 'The shape');
    case 'MultiPolygon':
      if (c.length === 0) return 'The shape is empty.';
      return c.map((polygon, i) => polygonProblem(polygon, `Part ${i + 1}`)).find(Boolean) || null;
    default: return `A ${geometry.type} cannot be amended here.`;
  }
}
