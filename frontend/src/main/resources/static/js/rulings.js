// The ruling page: a lead works through the drafts whose two reviews disagree or that were
// escalated, sees both verdicts side by side and on the map, and gives the final verdict.

import { get, request, uuid } from './api.js';
import { byId, el, say, timeOfDay } from './dom.js';
import { sample } from './legend.js';
import { showSignedIn } from './session.js';
import { draftCasing, draftLine, OKABE_ITO, STATES } from './styles.js';

const params = new URLSearchParams(location.search);
const batchId = params.get('batch');
const KIND_NAMES = { road: 'Road', building: 'Building' };
const CAUSES = {
  disagreement: 'The two reviews disagree.',
  escalation: 'A validator asked a lead to decide.',
};

// The shapes on the map: as drafted, and each review's amended shape where there is one.
const SHAPES = {
  drafted: { label: 'As drafted', style: { ...draftLine('UNDECIDED', 'road'), weight: 4 } },
  first: { label: 'First review’s shape', style: { color: OKABE_ITO.skyBlue, weight: 4, opacity: 1, dashArray: '6 5', fill: false } },
  second: { label: 'Second review’s shape', style: { color: OKABE_ITO.blue, weight: 4, opacity: 1, dashArray: '2 6', fill: false } },
};

let cases = [];
let index = 0;
let reasons = [];
let choice = null;
let map;
let shapes;

function choices(ruling) {
  const list = [{ id: 'accept', verdict: 'ACCEPT', label: 'Accept as drafted', key: 'a' }];
  if (ruling.first?.verdict === 'AMEND') list.push({ id: 'first', verdict: 'AMEND', label: 'Take the first review’s shape', key: '1', geometry: ruling.first.geometry });
  if (ruling.second?.verdict === 'AMEND') list.push({ id: 'second', verdict: 'AMEND', label: 'Take the second review’s shape', key: '2', geometry: ruling.second.geometry });
  list.push({ id: 'reject', verdict: 'REJECT', label: 'Reject', key: 'r' });
  return list;
}

function reasonLabel(verdict, code) {
  return reasons.find((r) => r.verdict === verdict && r.code === code)?.label || code;
}

function side(verdict) {
  if (!verdict) return el('p', { className: 'muted' }, 'No second review.');
  return el('div', { className: 'side-verdict', dataset: { verdict: verdict.verdict } },
    el('p', { className: 'side-line' }, sample(draftCasing(), draftLine(verdict.verdict, 'road')),
      el('strong', {}, STATES[verdict.verdict]?.label || verdict.verdict)),
    el('p', {}, reasonLabel(verdict.verdict, verdict.reasonCode)),
    verdict.comment ? el('p', { className: 'side-comment' }, `“${verdict.comment}”`) : null,
    el('p', { className: 'muted small' }, `${verdict.validator}${verdict.createdAt ? ' at ' + timeOfDay(verdict.createdAt) : ''}`));
}

function drawShapes(ruling) {
  shapes.clearLayers();
  const bounds = L.latLngBounds([]);
  const add = (geometry, key) => {
    const layer = L.geoJSON(geometry, { style: () => SHAPES[key].style, interactive: false }).addTo(shapes);
    bounds.extend(layer.getBounds());
  };
  add(ruling.geometry, 'drafted');
  if (ruling.first?.geometry) add(ruling.first.geometry, 'first');
  if (ruling.second?.geometry) add(ruling.second.geometry, 'second');
  if (bounds.isValid()) map.fitBounds(bounds, { padding: [60, 60], maxZoom: 19, animate: false });
  const shown = ['drafted', ruling.first?.geometry ? 'first' : null, ruling.second?.geometry ? 'second' : null].filter(Boolean);
  byId('ruling-key').replaceChildren(...shown.map((k) => el('li', {}, sample(SHAPES[k].style), ' ', SHAPES[k].label)));
}

function choose(id) {
  const ruling = cases[index];
  choice = choices(ruling).find((c) => c.id === id) || null;
  for (const button of byId('ruling-choices').children) {
    button.setAttribute('aria-pressed', String(button.dataset.choice === id));
  }
  const verdict = choice?.verdict;
  const select = byId('ruling-reason');
  const options = reasons.filter((r) => r.verdict === verdict);
  select.replaceChildren(...options.map((r) => el('option', { value: r.code, selected: r.isDefault }, r.label)));
  byId('ruling-reason-field').hidden = !choice;
  byId('ruling-record').disabled = !(choice && options.length);
}

function show() {
  const count = cases.length;
  byId('rulings-count').textContent = count ? `${count} waiting for a ruling` : 'Nothing is waiting for a ruling.';
  byId('case').hidden = !count;
  byId('ruling').hidden = !count;
  if (!count) {
    shapes.clearLayers();
    return;
  }
  index = Math.max(0, Math.min(index, count - 1));
  const ruling = cases[index];
  byId('case-title').textContent = `Draft ${index + 1} of ${count}`;
  byId('case-cause').textContent = CAUSES[ruling.cause] || ruling.cause;
  byId('case-kind').textContent = KIND_NAMES[ruling.kind] || ruling.kind;
  byId('case-confidence').textContent = `${Math.round(ruling.confidence * 100)} %`;
  byId('case-source').textContent = ruling.sourceId ?? '—';
  byId('case-cell').textContent = String(ruling.cellId);
  byId('side-first').replaceChildren(side(ruling.first));
  byId('side-second').replaceChildren(side(ruling.second));
  byId('ruling-choices').replaceChildren(...choices(ruling).map((c) => {
    const button = el('button', { type: 'button', className: 'verdict-button', 'aria-pressed': 'false', dataset: { choice: c.id, verdict: c.verdict } },
      el('span', {}, c.label), el('kbd', { 'aria-hidden': 'true' }, c.key));
    button.setAttribute('aria-keyshortcuts', c.key);
    button.addEventListener('click', () => choose(c.id));
    return button;
  }));
  byId('ruling-comment').value = '';
  choose(null);
  drawShapes(ruling);
}

async function record() {
  if (!choice) return;
  const ruling = cases[index];
  const body = { draftId: ruling.draftId, verdict: choice.verdict, reasonCode: byId('ruling-reason').value };
  const comment = byId('ruling-comment').value.trim();
  if (comment) body.comment = comment;
  if (choice.geometry) body.geometry = choice.geometry;
  const button = byId('ruling-record');
  button.disabled = true;
  try {
    await request('PUT', `api/rulings/${encodeURIComponent(uuid())}`, { json: body });
    say(byId('ruling-status'), `Ruled: ${choice.label}.`, 'ok');
    cases.splice(index, 1);
    show();
    byId('case-title').focus();
  } catch (e) {
    say(byId('ruling-status'), e.message, 'error');
    button.disabled = false;
  }
}

function bindKeys() {
  document.addEventListener('keydown', (e) => {
    const t = e.target;
    if (t.tagName === 'TEXTAREA' || t.tagName === 'SELECT' || e.altKey || e.ctrlKey || e.metaKey) return;
    if (!cases.length) return;
    const hit = choices(cases[index]).find((c) => c.key === e.key);
    if (hit) {
      e.preventDefault();
      choose(hit.id);
      byId('ruling-record').focus(); // Enter records; Tab goes back to the reason and comment
    } else if (e.key === 'n' || e.key === 'p') {
      e.preventDefault();
      index = (index + (e.key === 'n' ? 1 : cases.length - 1)) % cases.length;
      show();
    } else if (e.key === 'Enter' && t.tagName !== 'BUTTON') {
      e.preventDefault();
      record();
    }
  });
}

async function start() {
  const status = byId('load-status');
  try {
    await showSignedIn();
    if (!batchId) throw new Error('No batch given: open this page from the batch list.');
    const [batch, open, reasonList] = await Promise.all([get(`api/batches/${batchId}`), get(`api/batches/${batchId}/rulings`), get(`api/batches/${batchId}/reasons`)]);
    reasons = reasonList;
    cases = open;
    byId('rulings-batch').textContent = batch.name;
    document.title = `Rulings · ${batch.name}`;
    map = L.map('map', { zoomSnap: 0.5, maxZoom: 22 });
    map.attributionControl.setPrefix('<a href="https://leafletjs.com">Leaflet</a>');
    if (batch.imageryUrl) L.tileLayer(batch.imageryUrl, { maxZoom: 22, maxNativeZoom: 19, attribution: 'Imagery' }).addTo(map);
    else byId('map').classList.add('map-plain');
    shapes = L.layerGroup().addTo(map);
    const [w, s, e, n] = batch.bbox;
    map.fitBounds([[s, w], [n, e]]);
    byId('case-previous').addEventListener('click', () => { index = (index + cases.length - 1) % cases.length; show(); });
    byId('case-next').addEventListener('click', () => { index = (index + 1) % cases.length; show(); });
    byId('ruling-record').addEventListener('click', record);
    bindKeys();
    show();
  } catch (e) {
    say(status, e.message, 'error');
  }
}

start();
