// The cell page: loads the cell, draws it, and runs the review loop (choose a verdict and a
// reason, record it, move on). The verdict itself is decision.js; drawing is layers.js and
// panel.js; keys are keys.js.

import { get, post } from './api.js';
import { Decision } from './decision.js';
import { byId, say } from './dom.js';
import { bindKeys, writeHelp } from './keys.js';
import { boundsOf, createLayers, kindName, shownGeometry } from './layers.js';
import { addLegend } from './legend.js';
import { createMap, showCell } from './map.js';
import * as panel from './panel.js';
import { Review } from './review.js';
import { showSignedIn } from './session.js';
import { stateOf, STATES } from './styles.js';

const cellId = new URLSearchParams(location.search).get('cell');

let me, batch, review, map, layers, decision;

async function load() {
  me = await showSignedIn();
  const cell = await get(`api/cells/${encodeURIComponent(cellId)}`);
  const [batches, drafts, reference, reasons] = await Promise.all([
    get('api/batches'),
    get(`api/cells/${cell.id}/drafts`),
    get(`api/cells/${cell.id}/reference`),
    get(`api/batches/${cell.batchId}/reasons`),
  ]);
  batch = batches.find((b) => b.id === cell.batchId) || null;
  review = new Review(cell, drafts, reasons);
  map = createMap(byId('map'), { imageryUrl: batch?.imageryUrl, cellBbox: cell.bbox });
  addLegend(map);
  layers = createLayers(map, pick, describe);
  layers.setReference(reference);
  layers.setDrafts(review.drafts);
  decision = new Decision({ review, map, layers, username: me.username, reveal, recorded });
}

function describe(feature) {
  const position = review.drafts.indexOf(feature) + 1;
  return `Draft ${position} · ${kindName(feature.properties.kind)} · ${STATES[stateOf(feature)].label}`;
}

/** Brings a draft into view: panned to when it fits comfortably, else zoomed to. */
function reveal(feature, force = false) {
  const geometry = shownGeometry(feature);
  if (!geometry) return;
  const bounds = boundsOf(geometry);
  const view = map.getBounds();
  if (!force && view.contains(bounds)) return;
  const fits = bounds.getNorth() - bounds.getSouth() < (view.getNorth() - view.getSouth()) * 0.6
    && bounds.getEast() - bounds.getWest() < (view.getEast() - view.getWest()) * 0.6;
  if (!force && fits) map.panTo(bounds.getCenter());
  else map.fitBounds(bounds, { padding: [80, 80], maxZoom: 19, animate: false });
}

/** Shows the review's current draft, dropping any verdict being chosen. */
function select() {
  decision.drop();
  const draft = review.current;
  panel.showDraft(review);
  if (!draft) return;
  layers.setCurrent(draft);
  reveal(draft);
  panel.status('');
}

/** After a verdict is saved: update the cell, move to the next open draft, say what happened. */
function recorded(draft, said) {
  panel.showCell(review, batch);
  if (review.moveToNextOpen()) select();
  else {
    decision.drop();
    panel.showDraft(review);
  }
  panel.status(said, 'ok');
  (review.cell.finished ? byId('take-next') : byId('draft-title')).focus();
}

function pick(id) {
  if (!decision.busy && review.moveTo(id)) select();
}

function move(step) {
  if (!decision.busy && review.move(step)) select();
}

function nextOpen() {
  if (decision.busy) return;
  if (review.moveToNextOpen()) select();
  else panel.status('Every draft in this cell has a verdict.');
}

function toggle(id, apply) {
  const box = byId(id);
  box.checked = !box.checked;
  apply(box.checked);
}

async function release() {
  try {
    await post(`api/cells/${review.cell.id}/release`);
    location.assign('index.html');
  } catch (e) {
    panel.status(e.message, 'error');
  }
}

async function takeNext() {
  const status = byId('take-next-status');
  try {
    const cell = await post(`api/batches/${review.cell.batchId}/claims/next`);
    if (cell) location.assign(`work.html?cell=${encodeURIComponent(cell.id)}`);
    else say(status, 'No open cell is left in this batch. Thank you!', 'ok');
  } catch (e) {
    say(status, e.message, 'error');
  }
}

function wire() {
  const help = byId('help');
  const zoom = () => review.current && reveal(review.current, true);
  writeHelp(byId('help-list'));
  panel.buildVerdictButtons((verdict) => decision.choose(verdict));
  byId('record').addEventListener('click', () => decision.record());
  byId('previous').addEventListener('click', () => move(-1));
  byId('next').addEventListener('click', () => move(1));
  byId('zoom').addEventListener('click', zoom);
  byId('help-open').addEventListener('click', () => help.showModal());
  byId('release').addEventListener('click', release);
  byId('take-next').addEventListener('click', takeNext);
  byId('show-drafts').addEventListener('change', (e) => layers.showDrafts(e.target.checked));
  byId('show-reference').addEventListener('change', (e) => layers.showReference(e.target.checked));
  bindKeys({
    verdict: (verdict, shift) => decision.choose(verdict, !shift),
    reason: (number) => decision.pickNumber(number),
    record: () => decision.record(),
    cancel: () => {
      decision.drop();
      panel.status('');
    },
    next: () => move(1),
    previous: () => move(-1),
    nextOpen,
    zoom,
    comment: () => byId('comment').focus(),
    toggleDrafts: () => toggle('show-drafts', layers.showDrafts),
    toggleReference: () => toggle('show-reference', layers.showReference),
    help: () => help.showModal(),
  });
}

async function start() {
  if (!cellId) {
    location.replace('index.html');
    return;
  }
  try {
    await load();
  } catch (e) {
    say(byId('load-status'), `This cell could not be opened: ${e.message}`, 'error');
    return;
  }
  wire();
  panel.showCell(review, batch);
  panel.showHolder(review.cell, me);
  const first = review.current && shownGeometry(review.current);
  showCell(map, review.cell.bbox, first ? boundsOf(first) : null);
  select();
}

start();
