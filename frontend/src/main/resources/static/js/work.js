// The cell page: loads the cell, draws it, and runs the review loop (choose a verdict and a
// reason, record it, move on; take the last one back). The verdict itself is decision.js;
// drawing is layers.js and panel.js; keys are keys.js; verdicts waiting for the server are
// outbox.js.

import { get, NetworkError, post } from './api.js';
import { Decision } from './decision.js';
import { byId, say } from './dom.js';
import { bindKeys, writeHelp } from './keys.js';
import { boundsOf, createLayers, kindName, shownGeometry } from './layers.js';
import { addLegend } from './legend.js';
import { createMap, setImageryOpacity, showCell, showPlainBackground } from './map.js';
import { Outbox } from './outbox.js';
import * as panel from './panel.js';
import { Review } from './review.js';
import { showSignedIn } from './session.js';
import { stateOf, STATES } from './styles.js';

const cellId = new URLSearchParams(location.search).get('cell');

let me, batch, review, map, layers, decision, outbox;
let undoing = false;

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
  outbox = new Outbox(me.username, { sent, refused, changed: (count) => panel.showPending(count) });
  for (const entry of outbox.verdictsIn(cell.id)) {
    const draft = review.byId(entry.body.draftId);
    if (draft) review.kept(draft, entry.body, entry.id, me.username);
  }
  layers.setDrafts(review.drafts);
  decision = new Decision({ review, map, layers, outbox, username: me.username, reveal, recorded });
}

/** A kept verdict reached the server. */
function sent(entry, answer) {
  if (entry.withdraw) return; // the page already shows the draft as it was before
  const draft = entry.cellId === review.cell.id ? review.byId(entry.body.draftId) : null;
  if (!draft || draft.properties.verdict?.id !== entry.id) return;
  review.recorded(draft, entry.body, answer, me.username);
  layers.update(draft);
  panel.showCell(review, batch);
  if (draft === review.current) panel.showDraft(review);
  if (outbox.inCell(review.cell.id).length === 0) panel.status('Every verdict kept on this device is sent.', 'ok');
}

/** The server refused a kept verdict (the claim lapsed, the draft was ruled): show what stands. */
function refused(entry, error) {
  if (entry.withdraw) {
    panel.status(`An undo kept on this device was refused: ${error.message} Reload the page to see what stands.`, 'error');
    return;
  }
  const draft = entry.cellId === review.cell.id ? review.byId(entry.body.draftId) : null;
  if (draft && draft.properties.verdict?.id === entry.id) {
    review.restore(draft, entry.before);
    layers.update(draft);
    panel.showCell(review, batch);
    if (draft === review.current) panel.showDraft(review);
  }
  panel.status(`A verdict kept on this device was refused: ${error.message}`, 'error');
}

/** Takes back the last verdict: one still on this device is simply dropped, else the server withdraws it. */
async function undo() {
  if (decision.busy || undoing) return;
  decision.drop();
  const waiting = outbox.verdictsIn(review.cell.id);
  if (waiting.length > 0) {
    const entry = waiting[waiting.length - 1];
    outbox.take(entry.id);
    const draft = review.byId(entry.body.draftId);
    review.restore(draft, entry.before);
    const verb = STATES[entry.body.verdict].verb;
    undone(draft, entry.tried ? `Took back ${verb}; if it reached the server, it is withdrawn there once the server answers.`
      : `Took back ${verb} before it was sent.`);
    return;
  }
  const draft = review.latestOf(me.username);
  if (!draft) {
    panel.status('You have no verdict in this cell to take back.', 'error');
    return;
  }
  const verdict = draft.properties.verdict;
  undoing = true;
  panel.status('Taking back…');
  try {
    const answer = await post(`api/verdicts/${encodeURIComponent(verdict.id)}/withdrawal`);
    review.restore(draft, answer.restored, answer.cell);
    const now = answer.restored ? STATES[answer.restored.verdict].label.toLowerCase() : 'undecided';
    undone(draft, `Took back ${STATES[verdict.verdict].verb}; the draft is ${now} again.`);
  } catch (e) {
    panel.status(e instanceof NetworkError ? 'Undo needs the server; try again when it answers.' : e.message, 'error');
  } finally {
    undoing = false;
  }
}

function undone(draft, said) {
  layers.update(draft);
  review.moveTo(draft.id);
  select();
  panel.showCell(review, batch);
  panel.status(said, 'ok');
  byId('draft-title').focus();
}

let opacity = 1;
function imagery(step) {
  opacity = Math.min(1, Math.max(0, Math.round((opacity + step * 0.1) * 10) / 10));
  applyOpacity();
}

function applyOpacity() {
  const input = byId('imagery-opacity');
  const text = `${Math.round(opacity * 100)} %`;
  input.value = String(Math.round(opacity * 100));
  input.setAttribute('aria-valuetext', text);
  byId('imagery-opacity-value').textContent = text;
  if (!setImageryOpacity(map, opacity)) panel.status('This batch has no imagery.');
}

function plainBackground(plain) {
  if (!showPlainBackground(map, plain)) panel.status('This batch has no imagery.');
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
  byId('plain-background').addEventListener('change', (e) => plainBackground(e.target.checked));
  byId('imagery-opacity').addEventListener('input', (e) => {
    opacity = Number(e.target.value) / 100;
    applyOpacity();
  });
  byId('undo').addEventListener('click', undo);
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
    undo,
    join: () => decision.edit('join'),
    split: () => decision.edit('split'),
    removeVertex: () => panel.status(decision.editor ? 'Tab to a vertex first, then press Delete.' : 'Amend first: press m.'),
    imagery,
    plainBackground: () => toggle('plain-background', plainBackground),
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
  // after the frame that shows the first draft: what WorkspaceBenchmark reads
  requestAnimationFrame(() => requestAnimationFrame(() => performance.mark('assay:first-draft')));
  panel.showPending(outbox.count);
  outbox.flush();
}

start();
