// Map styles. Colours are the Okabe-Ito palette (Okabe and Ito 2008, Color Universal Design);
// every state also has its own dash pattern, so no state depends on colour alone. Drafts are
// never green. The current draft is thicker and sits on a yellow glow. Coloured lines sit on a dark casing, which keeps the light colours at 3:1 or
// more against a light background (WCAG 2.1, 1.4.11) and readable on imagery.

export const OKABE_ITO = {
  black: '#000000',
  orange: '#E69F00',
  skyBlue: '#56B4E9',
  bluishGreen: '#009E73', // not used for drafts
  yellow: '#F0E442',
  blue: '#0072B2',
  vermillion: '#D55E00',
  reddishPurple: '#CC79A7',
};

const CASING = '#1b1f24';
const HALO = '#ffffff';
const GLOW = OKABE_ITO.yellow; // around the current draft only, never a draft's own colour

/** Draft states: undecided, then one per verdict. `key` is the verdict's keyboard key. */
export const STATES = {
  UNDECIDED: { label: 'Undecided', color: OKABE_ITO.orange, dashArray: null },
  ACCEPT: { label: 'Accepted', verb: 'Accept', key: 'a', color: OKABE_ITO.blue, dashArray: '14 5' },
  AMEND: { label: 'Amended', verb: 'Amend', key: 'm', color: OKABE_ITO.skyBlue, dashArray: '6 5' },
  REJECT: { label: 'Rejected', verb: 'Reject', key: 'r', color: OKABE_ITO.vermillion, dashArray: '1 6' },
  ESCALATE: { label: 'Escalated', verb: 'Escalate', key: 'e', color: OKABE_ITO.reddishPurple, dashArray: '12 4 1 4' },
};

export const VERDICTS = ['ACCEPT', 'AMEND', 'REJECT', 'ESCALATE'];

export const stateOf = (feature) => feature.properties.verdict?.verdict || 'UNDECIDED';

const isArea = (kind) => kind === 'building';

export function draftLine(state, kind) {
  const s = STATES[state];
  return {
    color: s.color, weight: 3, opacity: 1, dashArray: s.dashArray, lineCap: 'round', lineJoin: 'round',
    fill: isArea(kind), fillColor: s.color, fillOpacity: 0.14,
  };
}

export function draftCasing() {
  return { color: CASING, weight: 5.5, opacity: 0.75, dashArray: null, fill: false, lineJoin: 'round' };
}

export const hidden = { opacity: 0, fillOpacity: 0 };

/** The current draft: thicker, on a white halo, whatever its state. */
export function currentStyles(state, kind) {
  const line = draftLine(state, kind);
  return {
    halo: { color: GLOW, weight: 16, opacity: 0.8, fill: false, lineJoin: 'round', interactive: false },
    casing: { ...draftCasing(), weight: 8.5, opacity: 0.9, interactive: false },
    line: { ...line, weight: 5, fillOpacity: 0.22, interactive: false },
  };
}

export const reference = {
  line: { color: OKABE_ITO.black, weight: 1.5, opacity: 0.85, dashArray: '4 4', lineCap: 'butt', fillColor: '#000000', fillOpacity: 0.06, interactive: false },
  casing: { color: HALO, weight: 4, opacity: 0.55, fill: false, interactive: false },
};

/** Reference styles for a feature: only areas are filled. */
export function referenceStyle(part, feature) {
  return { ...reference[part], fill: part === 'line' && isArea(feature.properties?.kind) };
}

/** The shade over everything outside the cell. */
export const outside = { stroke: true, color: HALO, weight: 1.5, opacity: 0.9, fillColor: '#0d1014', fillOpacity: 0.28, interactive: false };

/** Where a check points (the join of a near miss, a crossing): a white ring on black, unlike any draft. */
export const flagMarker = { radius: 7, color: OKABE_ITO.black, weight: 3, opacity: 1, fillColor: HALO, fillOpacity: 0.9, dashArray: null, interactive: true };
