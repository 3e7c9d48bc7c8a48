// The start page: my cells to resume, the batches with their progress, and taking the next cell.

import { get, post } from './api.js';
import { byId, cellNumber, el, fillBar, say, timeOfDay } from './dom.js';
import { isLead, showSignedIn } from './session.js';

const number = new Intl.NumberFormat();
const STATE_NAMES = { OPEN: 'Open', PAUSED: 'Paused', CLOSED: 'Closed' };

function bar(part, whole) {
  const node = el('span', { className: 'bar', 'aria-hidden': 'true' }, el('span', { className: 'bar-fill' }));
  fillBar(node, part, whole);
  return node;
}

function progress(part, whole) {
  return el('div', { className: 'progress' }, bar(part, whole),
    el('span', { className: 'progress-text' }, `${number.format(part)} / ${number.format(whole)}`));
}

/** Claims the batch's next cell and opens it; 204 means none is left. */
async function takeNextCell(batch, button, status) {
  button.disabled = true;
  say(status, '');
  try {
    const cell = await post(`api/batches/${batch.id}/claims/next`);
    if (cell) {
      location.assign(`work.html?cell=${encodeURIComponent(cell.id)}`);
      return;
    }
    say(status, 'No open cell is left in this batch.', 'info');
  } catch (e) {
    say(status, e.message, 'error');
  }
  button.disabled = false;
}

function batchRow(batch, me) {
  const status = el('p', { className: 'status status-inline', role: 'status', hidden: true });
  const take = el('button', { type: 'button', className: 'button button-primary' }, 'Take next cell');
  take.setAttribute('aria-describedby', `batch-${batch.id}-name`);
  take.addEventListener('click', () => takeNextCell(batch, take, status));
  const actions = el('div', { className: 'actions' }, take);
  if (isLead(me)) {
    actions.append(el('a', { className: 'button button-quiet', href: `rulings.html?batch=${encodeURIComponent(batch.id)}` },
      'Rulings', el('span', { className: 'visually-hidden' }, ` of ${batch.name}`)));
    actions.append(el('a', { className: 'button button-quiet', href: `lead.html?batch=${encodeURIComponent(batch.id)}` },
      'Overview', el('span', { className: 'visually-hidden' }, ` of ${batch.name}`)));
  }
  actions.append(status);
  const model = [batch.modelName, batch.modelVersion].filter(Boolean).join(' ');
  return el('tr', {},
    el('th', { scope: 'row' },
      el('span', { className: 'batch-name', id: `batch-${batch.id}-name` }, batch.name),
      el('span', { className: 'muted small' }, model ? `Model ${model}` : ''),
      batch.imageryUrl ? null : el('span', { className: 'muted small' }, 'No imagery')),
    el('td', {}, el('span', { className: 'tag', dataset: { state: batch.state } }, STATE_NAMES[batch.state] || batch.state)),
    el('td', {}, progress(batch.decidedCount, batch.draftCount)),
    el('td', {}, progress(batch.finishedCells, batch.cellCount)),
    el('td', {}, actions));
}

function cellItem(cell, batchesById, me) {
  const batch = batchesById.get(cell.batchId);
  const mine = cell.holder === me.username;
  const note = mine && cell.leaseExpiresAt ? `held until ${timeOfDay(cell.leaseExpiresAt)}` : 'assigned to you';
  return el('li', { className: 'cell-item' },
    el('div', {},
      el('span', { className: 'cell-title' }, `Cell ${cellNumber(cell)}`),
      el('span', { className: 'muted' }, ` · ${batch ? batch.name : 'Batch ' + cell.batchId} · ${note}`)),
    progress(cell.decidedCount, cell.draftCount),
    el('a', { className: 'button', href: `work.html?cell=${encodeURIComponent(cell.id)}` },
      cell.finished ? 'Open' : 'Resume', el('span', { className: 'visually-hidden' }, ` cell ${cellNumber(cell)}`)));
}

const VERDICT_WORDS = [['ACCEPT', 'Accepted'], ['AMEND', 'Amended'], ['REJECT', 'Rejected'], ['ESCALATE', 'Escalated']];

/** The validator's own figures since local midnight, and the quickest way back to work. */
function showToday(progress, batches, me) {
  const figure = (term, value) => [el('div', {}, el('dt', {}, term), el('dd', {}, number.format(value)))];
  byId('today-figures').replaceChildren(
    ...figure('Drafts decided today', progress.decided),
    ...VERDICT_WORDS.flatMap(([key, word]) => figure(word, progress.verdicts[key] || 0)),
    ...figure('Cells finished today', progress.cellsFinished),
    ...figure('Verdicts taken back', progress.withdrawn));
  const held = progress.cells.find((c) => c.holder === me.username && !c.finished) || progress.cells[0];
  const resume = byId('resume');
  resume.hidden = !held;
  if (held) {
    resume.href = `work.html?cell=${encodeURIComponent(held.id)}`;
    resume.textContent = `Resume cell ${cellNumber(held)}${held.pass === 2 ? ' (second review)' : ''}`;
  }
  const open = batches.find((b) => b.state === 'OPEN');
  const take = byId('take-next-any');
  take.hidden = !open || Boolean(held);
  if (open) {
    take.onclick = () => takeNextCell(open, take, byId('today-status'));
    take.textContent = `Take next cell of ${open.name}`;
  }
}

async function start() {
  const status = byId('home-status');
  try {
    const me = await showSignedIn();
    if (isLead(me)) {
      byId('batches-title').after(el('p', {}, el('a', { href: 'overview.html' }, 'All my batches at a glance')));
    }
    const midnight = new Date();
    midnight.setHours(0, 0, 0, 0);
    const [batches, progress] = await Promise.all([
      get('api/batches'),
      get(`api/my/progress?since=${encodeURIComponent(midnight.toISOString())}`),
    ]);
    const cells = progress.cells;
    showToday(progress, batches, me);
    const batchesById = new Map(batches.map((b) => [b.id, b]));
    byId('my-cells').replaceChildren(...cells.map((c) => cellItem(c, batchesById, me)));
    byId('my-cells-empty').hidden = cells.length > 0;
    byId('batches').tBodies[0].replaceChildren(...batches.map((b) => batchRow(b, me)));
    byId('batches').hidden = batches.length === 0;
    byId('batches-empty').hidden = batches.length > 0;
  } catch (e) {
    say(status, e.message, 'error');
  }
}

start();
