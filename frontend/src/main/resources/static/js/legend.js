// The map key: one sample line per state, drawn with the same styles as the map.

import { el } from './dom.js';
import { currentStyles, draftCasing, draftLine, outside, reference, STATES } from './styles.js';

const SVG = 'http://www.w3.org/2000/svg';

function stroke(style) {
  const line = document.createElementNS(SVG, 'line');
  const attrs = { x1: 6, y1: 8, x2: 38, y2: 8, stroke: style.color, 'stroke-width': style.weight,
    'stroke-opacity': style.opacity, 'stroke-linecap': style.lineCap || 'round' };
  if (style.dashArray) attrs['stroke-dasharray'] = style.dashArray;
  for (const [k, v] of Object.entries(attrs)) line.setAttribute(k, v);
  return line;
}

/** A small SVG line drawn with the given path styles, bottom first. */
export function sample(...styles) {
  const svg = document.createElementNS(SVG, 'svg');
  svg.setAttribute('viewBox', '0 0 44 16');
  svg.setAttribute('width', '44');
  svg.setAttribute('height', '16');
  svg.setAttribute('aria-hidden', 'true');
  svg.append(...styles.map(stroke));
  return svg;
}

function shadeSample() {
  const svg = sample();
  const rect = document.createElementNS(SVG, 'rect');
  for (const [k, v] of Object.entries({ x: 6, y: 2, width: 32, height: 12, fill: outside.fillColor, 'fill-opacity': outside.fillOpacity })) {
    rect.setAttribute(k, v);
  }
  svg.append(rect);
  return svg;
}

function entries() {
  const rows = Object.keys(STATES).map((state) => [sample(draftCasing(), draftLine(state, 'road')), STATES[state].label]);
  const c = currentStyles('UNDECIDED', 'road');
  rows.splice(1, 0, [sample(c.halo, c.casing, c.line), 'Current draft']);
  rows.push([sample(reference.casing, reference.line), 'Reference (already mapped)']);
  rows.push([shadeSample(), 'Outside the cell']);
  return rows;
}

/** Adds the key to the map's lower left corner. */
export function addLegend(map) {
  const Legend = L.Control.extend({
    onAdd() {
      const list = el('ul', { className: 'legend-list' },
        ...entries().map(([svg, label]) => el('li', {}, svg, el('span', {}, label))));
      // Folded on short screens, where it would cover too much of the map.
      const open = map.getSize().y >= 560;
      const box = el('details', { className: 'legend', open }, el('summary', {}, 'Key'), list);
      L.DomEvent.disableClickPropagation(box);
      L.DomEvent.disableScrollPropagation(box);
      return box;
    },
  });
  new Legend({ position: 'bottomleft' }).addTo(map);
}
