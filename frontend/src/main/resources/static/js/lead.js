// The lead's overview of one batch: progress and forecast, the cells on a map, throughput and
// pace, agreement and reason codes, what the model gets wrong, and the exports. Every chart has
// its table and a CSV download; the page refreshes itself every 30 seconds while it is visible.
// Figures come from api/batches/{id}/dashboard (grouped in the database), agreement and
// calibration from their own reports.

import { get, post } from './api.js';
import { byId, cellNumber, el, say } from './dom.js';
import { chart, tableView } from './figures.js';
import { showSignedIn } from './session.js';
import { OKABE_ITO, STATES, VERDICTS } from './styles.js';

const REFRESH_MS = 30000;
const batchId = new URLSearchParams(location.search).get('batch');
const zone = Intl.DateTimeFormat().resolvedOptions().timeZone || 'UTC';
const number = new Intl.NumberFormat();
const SERIES = [OKABE_ITO.blue, OKABE_ITO.orange, OKABE_ITO.reddishPurple, OKABE_ITO.skyBlue,
  OKABE_ITO.vermillion, OKABE_ITO.bluishGreen, OKABE_ITO.black, OKABE_ITO.yellow];

// Cell states: colour and dash (the legend shows both), so that no state rests on colour alone.
const CELL_STATES = {
  open: { label: 'Open', color: '#7f8a94', dashArray: '2 4' },
  assigned: { label: 'Assigned', color: OKABE_ITO.skyBlue, dashArray: '8 4' },
  claimed: { label: 'Being reviewed', color: OKABE_ITO.blue, dashArray: null },
  'second-review': { label: 'In second review', color: OKABE_ITO.orange, dashArray: '12 4 2 4' },
  finished: { label: 'Finished', color: OKABE_ITO.black, dashArray: null },
};
// Risk from low to high: light yellow to vermillion (sequential, readable by colour-blind people).
const RISK_STEPS = [
  { upTo: 0.2, color: '#fbf3b0', label: 'Risk under 0.2' },
  { upTo: 0.4, color: '#f0e442', label: '0.2 to 0.4' },
  { upTo: 0.6, color: '#e69f00', label: '0.4 to 0.6' },
  { upTo: 0.8, color: '#d55e00', label: '0.6 to 0.8' },
  { upTo: Infinity, color: '#8c3b00', label: '0.8 and above' },
];

let cellMap, cellLayer, cells = [], colourBy = 'state', validators = [];

const api = (path) => `api/batches/${encodeURIComponent(batchId)}/${path}`;
const csvLink = (name) => api(`dashboard/${name}.csv?zone=${encodeURIComponent(zone)}`);

function hourLabel(iso) {
  return new Date(iso).toLocaleTimeString([], { hour: '2-digit', minute: '2-digit', timeZone: zone });
}

function dateLabel(iso) {
  if (!iso) return 'not foreseeable at the recent pace';
  return new Date(iso).toLocaleString([], { dateStyle: 'medium', timeStyle: 'short', timeZone: zone });
}

function perValidatorBars(id, table, label) {
  const names = table.columns.slice(2);
  chart(id, {
    type: 'bar',
    data: {
      labels: table.rows.map((r) => label(r[0])),
      datasets: names.map((name, i) => ({
        label: name, data: table.rows.map((r) => r[i + 2]), backgroundColor: SERIES[i % SERIES.length],
      })),
    },
    options: { scales: { x: { stacked: true }, y: { stacked: true, beginAtZero: true, title: { display: true, text: 'drafts decided' } } } },
  });
}

function showProgress(view) {
  const p = view.progress;
  const f = p.forecast;
  const figure = (term, value) => el('div', {}, el('dt', {}, term), el('dd', {}, value));
  byId('figures').replaceChildren(
    figure('Drafts', number.format(p.drafts)),
    figure('Decided', number.format(p.decided)),
    figure('Open', number.format(p.open)),
    figure('Cells finished', `${number.format(p.cellsFinished)} of ${number.format(p.cells)}`),
    figure('Recent pace', `${number.format(f.pacePerDay)} a day`));
  byId('forecast').textContent = p.open === 0
    ? 'Every draft has a verdict.'
    : `Expected finish: ${dateLabel(f.expected)} (range ${f.earliest ? dateLabel(f.earliest) : '?'} to `
      + `${f.latest ? dateLabel(f.latest) : 'open-ended'}), from ${f.paceDays} recent day(s) of work.`;
  const burndown = view.tables.burndown;
  chart('chart-burndown', {
    type: 'line',
    data: {
      labels: burndown.rows.map((r) => r[0]),
      datasets: [{ label: 'Open drafts', data: burndown.rows.map((r) => r[1]), borderColor: OKABE_ITO.blue, backgroundColor: OKABE_ITO.blue, stepped: true }],
    },
    options: { scales: { y: { beginAtZero: true, title: { display: true, text: 'open drafts' } } } },
  });
  tableView(byId('table-burndown'), burndown, 'Burn-down', csvLink('burndown'));
}

function showThroughput(view) {
  const t = view.tables;
  perValidatorBars('chart-hourly', t['throughput-hourly'], hourLabel);
  tableView(byId('table-throughput-hourly'), t['throughput-hourly'], 'Drafts per hour', csvLink('throughput-hourly'));
  perValidatorBars('chart-daily', t['throughput-daily'], (d) => d);
  tableView(byId('table-throughput-daily'), t['throughput-daily'], 'Drafts per day', csvLink('throughput-daily'));
  const pace = t.pace;
  validators = pace.rows.map((r) => r[0]);
  byId('pace-note').textContent = `Seconds between one validator's consecutive verdicts; gaps over ${view.breakMinutes} minutes count as breaks and are left out. Times in ${view.zone}.`;
  chart('chart-pace', {
    type: 'bar',
    data: {
      labels: pace.rows.map((r) => r[0]),
      datasets: [
        { label: 'median s', data: pace.rows.map((r) => r[3] || 0), backgroundColor: OKABE_ITO.blue },
        { label: '90th percentile s', data: pace.rows.map((r) => r[4] || 0), backgroundColor: OKABE_ITO.orange },
      ],
    },
    options: { indexAxis: 'y', scales: { x: { beginAtZero: true, title: { display: true, text: 'seconds per draft' } } } },
  });
  tableView(byId('table-pace'), pace, 'Pace', csvLink('pace'));
  tableView(byId('table-cells-daily'), t['cells-daily'], 'Cells finished per day', csvLink('cells-daily'));
}

function showQuality(view, agreement) {
  const t = view.tables;
  chart('chart-reasons', {
    type: 'bar',
    data: {
      labels: t.reasons.rows.map((r) => `${STATES[r[0]]?.label || r[0]}: ${r[1]}`),
      datasets: [{ label: 'drafts', data: t.reasons.rows.map((r) => r[2]), backgroundColor: t.reasons.rows.map((r) => STATES[r[0]]?.color || OKABE_ITO.black) }],
    },
    options: { indexAxis: 'y', plugins: { legend: { display: false } }, scales: { x: { beginAtZero: true } } },
  });
  tableView(byId('table-reasons'), t.reasons, 'Reason codes of the standing verdicts', csvLink('reasons'));
  tableView(byId('table-reasons-by-validator'), t['reasons-by-validator'], 'Reason codes per validator', csvLink('reasons-by-validator'));

  const pairs = (agreement?.pairs || []).map((p) => [p.first, p.second, p.verdicts.drafts, p.verdicts.kappa ?? '', p.verdicts.band || '']);
  const team = agreement?.team;
  const ruled = (agreement?.validators || []).map((v) => [v.validator, v.reviewed, v.ruled, v.overturned?.count ?? v.overturned ?? '', v.overturned?.share ?? '']);
  const holder = byId('agreement');
  holder.replaceChildren();
  const pairsBox = el('div');
  const ruledBox = el('div');
  holder.append(el('p', {}, team && team.drafts
    ? `Team agreement over ${number.format(team.drafts)} drafts reviewed twice: Fleiss' kappa ${fmt(team.fleiss?.kappa)}, Krippendorff's alpha ${fmt(team.krippendorffAlpha?.alpha)}.`
    : 'No draft has been reviewed twice yet.'), pairsBox, ruledBox);
  tableView(pairsBox, { columns: ['first', 'second', 'drafts', 'cohen_kappa', 'band'], rows: pairs }, 'Agreement per pair', api('agreement/pairs.csv'));
  tableView(ruledBox, { columns: ['validator', 'reviewed_twice_or_ruled', 'ruled', 'overturned', 'overturned_share'], rows: ruled }, 'Overturned by rulings', api('agreement/validators.csv'));
}

const fmt = (x) => (typeof x === 'number' ? x.toFixed(3) : '–');

function showModel(view, calibration) {
  const confidence = view.tables.confidence;
  const bandLabel = (r) => `${r[0].toFixed(1)}–${r[1].toFixed(1)}`;
  chart('chart-confidence', {
    type: 'bar',
    data: {
      labels: confidence.rows.map(bandLabel),
      datasets: VERDICTS.map((verdict, i) => ({
        label: STATES[verdict].label, data: confidence.rows.map((r) => r[3 + i]), backgroundColor: STATES[verdict].color,
      })),
    },
    options: { scales: { x: { stacked: true, title: { display: true, text: 'model confidence' } }, y: { stacked: true, beginAtZero: true } } },
  });
  tableView(byId('table-confidence'), confidence, 'Verdicts by confidence band', csvLink('confidence'));
  tableView(byId('table-flags'), view.tables.flags, 'Verdicts by flag', csvLink('flags'));

  const bands = calibration?.bands || [];
  const rows = bands.map((b) => [`${b.lower.toFixed(1)}–${b.upper.toFixed(1)}`, b.drafts, b.accepted, b.rate ?? '', b.ci95 ? b.ci95[0] : '', b.ci95 ? b.ci95[1] : '']);
  chart('chart-calibration', {
    type: 'line',
    data: {
      labels: rows.map((r) => r[0]),
      datasets: [
        { label: 'share kept', data: bands.map((b) => b.rate), borderColor: OKABE_ITO.blue, backgroundColor: OKABE_ITO.blue, spanGaps: true },
        { label: '95% interval, lower', data: bands.map((b) => b.ci95?.[0]), borderColor: OKABE_ITO.orange, borderDash: [6, 4], pointRadius: 0, spanGaps: true },
        { label: '95% interval, upper', data: bands.map((b) => b.ci95?.[1]), borderColor: OKABE_ITO.orange, borderDash: [6, 4], pointRadius: 0, spanGaps: true },
      ],
    },
    options: { scales: { y: { min: 0, max: 1, title: { display: true, text: 'share kept (accepted or amended)' } } } },
  });
  tableView(byId('table-calibration'), { columns: ['confidence', 'drafts', 'kept', 'share', 'wilson95_lower', 'wilson95_upper'], rows }, 'Calibration', api('calibration.csv'));
}

// ---- the cells map ----

function cellStyle(cell) {
  if (colourBy === 'risk') {
    const step = RISK_STEPS.find((s) => cell.risk < s.upTo);
    return { color: '#1b1f24', weight: 1, dashArray: null, fillColor: step.color, fillOpacity: 0.75 };
  }
  const s = CELL_STATES[cell.state] || CELL_STATES.open;
  return { color: s.color, weight: cell.state === 'open' ? 1.5 : 2.5, dashArray: s.dashArray, fillColor: s.color, fillOpacity: cell.state === 'finished' ? 0.35 : 0.12 };
}

function showLegend() {
  const items = colourBy === 'risk'
    ? RISK_STEPS.map((s) => el('li', {}, el('span', { className: 'swatch', dataset: { colour: s.color } }), s.label))
    : Object.values(CELL_STATES).map((s) => el('li', {}, el('span', { className: 'swatch', dataset: s.dashArray ? { dash: '1', colour: s.color } : { colour: s.color } }), s.label));
  byId('cell-legend').replaceChildren(...items);
  // colours are set through the CSS object model, never inline style attributes
  byId('cell-legend').querySelectorAll('.swatch').forEach((node) => {
    node.style.borderColor = node.dataset.colour;
    node.style.background = colourBy === 'risk' ? node.dataset.colour : 'transparent';
  });
}

function drawCells() {
  if (!cellMap) {
    cellMap = L.map('cell-map', { zoomSnap: 0.25, attributionControl: false, keyboard: true });
    cellLayer = L.layerGroup().addTo(cellMap);
  }
  cellLayer.clearLayers();
  const boxes = cells.map((cell) => {
    const [w, s, e, n] = cell.bbox;
    return L.latLngBounds([s, w], [n, e]);
  });
  // the view first: shapes added to a map without one are projected wrongly
  if (boxes.length && !cellMap.fittedOnce) {
    cellMap.fitBounds(boxes.reduce((all, box) => all.extend(box), L.latLngBounds(boxes[0].getSouthWest(), boxes[0].getNorthEast())), { padding: [10, 10] });
    cellMap.fittedOnce = true;
  }
  cells.forEach((cell, i) => {
    const rect = L.rectangle(boxes[i], cellStyle(cell));
    rect.bindTooltip(`Cell ${cellNumber(cell)} · ${CELL_STATES[cell.state]?.label || cell.state} · risk ${cell.risk}`);
    rect.on('click', () => showCell(cell));
    cellLayer.addLayer(rect);
  });
  showLegend();
}

function showCell(cell) {
  const detail = byId('cell-detail');
  const fact = (term, value) => el('div', {}, el('dt', {}, term), el('dd', {}, value));
  const status = el('p', { className: 'status', role: 'status', hidden: true });
  const actions = el('div', { className: 'panel-actions' },
    el('a', { className: 'button button-small', href: `work.html?cell=${encodeURIComponent(cell.id)}` }, 'Look at its drafts'));
  if (cell.holder) {
    const release = el('button', { type: 'button', className: 'button button-small button-caution' }, `Release ${cell.holder}'s claim`);
    release.addEventListener('click', async () => {
      try {
        await post(`api/cells/${cell.id}/release`);
        say(status, 'Released.', 'ok');
        refresh();
      } catch (e) {
        say(status, e.message, 'error');
      }
    });
    actions.append(release);
  }
  const input = el('input', { id: 'assign-to', type: 'text', autocomplete: 'off', required: true });
  input.setAttribute('list', 'known-validators');
  const list = el('datalist', { id: 'known-validators' }, ...validators.map((v) => el('option', { value: v })));
  const form = el('form', { className: 'inline-form' }, el('label', { for: 'assign-to' }, 'Assign to'), input, list,
    el('button', { type: 'submit', className: 'button button-small' }, 'Assign'));
  form.addEventListener('submit', async (event) => {
    event.preventDefault();
    try {
      await post(`api/cells/${cell.id}/assignment`, { validator: input.value.trim() });
      say(status, `Assigned to ${input.value.trim()}.`, 'ok');
      refresh();
    } catch (e) {
      say(status, e.message, 'error');
    }
  });
  detail.replaceChildren(
    el('h3', {}, `Cell ${cellNumber(cell)}`),
    el('dl', { className: 'facts' },
      fact('State', CELL_STATES[cell.state]?.label || cell.state),
      fact('Drafts decided', `${number.format(cell.decided)} of ${number.format(cell.drafts)}`),
      fact('Risk', String(cell.risk)),
      fact('Held by', cell.holder ? `${cell.holder} until ${hourLabel(cell.leaseExpiresAt)}` : 'nobody'),
      fact('Assigned to', cell.assignedTo || 'nobody')),
    actions, form, status, el('div', { id: 'cell-history' }, el('p', { className: 'muted small' }, 'Loading its history…')));
  showHistory(cell);
}

/** The cell's drafts by standing verdict and its verdict log, newest first. */
async function showHistory(cell) {
  let history;
  try {
    history = await get(api(`dashboard/cells/${encodeURIComponent(cell.id)}/history`));
  } catch (e) {
    byId('cell-history')?.replaceChildren(el('p', { className: 'status', dataset: { kind: 'error' } }, e.message));
    return;
  }
  const holder = byId('cell-history');
  if (!holder) return;
  const standing = Object.entries(history.standing).map(([v, n]) => `${STATES[v]?.label || v} ${number.format(n)}`).join(', ');
  const when = (iso) => (iso ? dateLabel(iso) : '');
  const rows = history.events.map((e) => [when(e.at), e.by, e.sourceId || `#${e.draftId}`, STATES[e.verdict]?.label || e.verdict,
    e.reasonCode, e.pass, e.withdrawnAt ? `taken back ${when(e.withdrawnAt)}` : '']);
  const box = el('div');
  holder.replaceChildren(
    el('p', {}, standing ? `Standing verdicts: ${standing}.` : 'No draft of this cell has a verdict yet.'),
    history.finishedAt ? el('p', { className: 'small' }, `First review finished ${when(history.finishedAt)}`
      + (history.secondPassFinishedAt ? `; second review finished ${when(history.secondPassFinishedAt)}.` : '.')) : null,
    box);
  tableView(box, { columns: ['when', 'by', 'draft', 'verdict', 'reason', 'pass', 'withdrawn'], rows }, 'Verdict log of the cell', null);
  box.querySelector('details').open = true;
}

// ---- exports ----

function exportLinks() {
  byId('export-geojson').href = api('export.geojson');
  byId('export-gpkg').href = api('export.gpkg');
  const training = () => {
    const query = new URLSearchParams({
      zoom: byId('training-zoom').value, roadWidth: byId('training-width').value,
      amended: String(byId('training-amended').checked),
    });
    const reasons = byId('training-reasons').value.trim();
    if (reasons) query.set('reasons', reasons);
    byId('export-training').href = api(`training.zip?${query}`);
  };
  byId('training-form').addEventListener('input', training);
  byId('training-form').addEventListener('submit', (e) => e.preventDefault());
  training();
}

// ---- loading ----

async function refresh() {
  const status = byId('lead-status');
  try {
    const [view, agreement, calibration, cellList] = await Promise.all([
      get(api(`dashboard?zone=${encodeURIComponent(zone)}`)),
      get(api('agreement')).catch(() => null),
      get(api('calibration')).catch(() => null),
      get(api('dashboard/cells')),
    ]);
    cells = cellList;
    showProgress(view);
    drawCells();
    showThroughput(view);
    showQuality(view, agreement);
    showModel(view, calibration);
    byId('refreshed').textContent = `Updated ${hourLabel(view.generatedAt)} (${zone}); refreshes every 30 s.`;
    say(status, '');
    document.body.dataset.loaded = 'true';
  } catch (e) {
    say(status, e.message, 'error');
  }
}

async function start() {
  await showSignedIn();
  if (!batchId) {
    say(byId('lead-status'), 'No batch given: open this page from the list of batches.', 'error');
    return;
  }
  const batch = await get(`api/batches/${encodeURIComponent(batchId)}`);
  document.title = `${batch.name} · Overview · Assay`;
  byId('batch-name').textContent = batch.name;
  byId('batch-model').textContent = [batch.modelName, batch.modelVersion].filter(Boolean).join(' ');
  byId('rulings-link').href = `rulings.html?batch=${encodeURIComponent(batchId)}`;
  document.querySelectorAll('input[name=cell-colour]').forEach((radio) => radio.addEventListener('change', () => {
    colourBy = radio.value;
    drawCells();
  }));
  byId('cell-pick').addEventListener('submit', (event) => {
    event.preventDefault();
    const wanted = Number(byId('cell-number').value) - 1;
    const cell = cells.find((c) => c.seq === wanted);
    if (cell) showCell(cell);
    else say(byId('lead-status'), `No cell ${wanted + 1} in this batch.`, 'error');
  });
  exportLinks();
  await refresh();
  setInterval(() => {
    if (document.visibilityState === 'visible') refresh();
  }, REFRESH_MS);
}

start().catch((e) => say(byId('lead-status'), e.message, 'error'));
