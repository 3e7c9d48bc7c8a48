// The review panel beside the map: the cell's progress, the current draft's facts, and the
// verdict being chosen. It only writes the DOM; work.js decides what happens.

import { byId, cellNumber, el, fillBar, say, timeOfDay } from './dom.js';
import { kindName } from './layers.js';
import { sample } from './legend.js';
import { draftCasing, draftLine, STATES, VERDICTS } from './styles.js';

const NONE = '—';

/** Builds the four verdict buttons; `onChoose(verdict)` runs on a click. */
export function buildVerdictButtons(onChoose) {
  byId('verdict-buttons').replaceChildren(...VERDICTS.map((verdict) => {
    const s = STATES[verdict];
    const button = el('button', { type: 'button', className: 'verdict-button', 'aria-pressed': 'false', dataset: { verdict } },
      sample(draftCasing(), draftLine(verdict, 'road')), el('span', {}, s.verb), el('kbd', { 'aria-hidden': 'true' }, s.key));
    button.setAttribute('aria-keyshortcuts', s.key);
    button.addEventListener('click', () => onChoose(verdict));
    return button;
  }));
}

export function showCell(review, batch) {
  const cell = review.cell;
  const of = batch ? ` of ${batch.cellCount}` : '';
  const second = cell.pass === 2;
  byId('cell-title').textContent = `Cell ${cellNumber(cell)}${of}`;
  document.title = `${second ? 'Second review · ' : ''}Cell ${cellNumber(cell)} · ${batch ? batch.name : 'Assay'}`;
  const pass = byId('cell-pass');
  pass.hidden = !second;
  pass.textContent = second ? 'Second review (blind)' : '';
  pass.title = second ? 'You review this cell again without seeing the first verdicts.' : '';
  byId('cell-batch').textContent = batch ? [batch.name, batch.modelName, batch.modelVersion].filter(Boolean).join(' · ') : '';
  byId('cell-progress').textContent = `${review.decided} / ${review.count} decided`;
  fillBar(byId('cell-bar'), review.decided, review.count);
  byId('finished').hidden = !cell.finished;
}

/** Says how many verdicts wait on this device for the server. */
export function showPending(count) {
  const strip = byId('pending');
  strip.hidden = count === 0;
  strip.textContent = count === 0 ? '' : `${count} pending`;
  strip.title = count === 0 ? '' : 'Kept on this device; sent when the server answers again';
}

/** Says who holds the cell when that is worth knowing. */
export function showHolder(cell, me) {
  let note = '';
  if (cell.holder && cell.holder !== me.username) note = `This cell is held by ${cell.holder}; your verdicts may be refused.`;
  else if (cell.holder === me.username && cell.leaseExpiresAt) note = `Held by you until ${timeOfDay(cell.leaseExpiresAt)}.`;
  else if (!cell.holder && !cell.finished) note = 'Nobody holds this cell at the moment.';
  say(byId('cell-note'), note);
}

function confidence(value) {
  if (typeof value !== 'number') return NONE;
  return value <= 1 ? `${Math.round(value * 100)} %` : String(value);
}

export function showDraft(review) {
  const draft = review.current;
  if (!draft) {
    byId('draft-title').textContent = 'No drafts in this cell';
    return;
  }
  const p = draft.properties;
  byId('draft-title').textContent = `Draft ${review.index + 1} of ${review.count}`;
  byId('draft-kind').textContent = kindName(p.kind);
  byId('draft-confidence').textContent = confidence(p.confidence);
  byId('draft-class').textContent = p.class || NONE;
  byId('draft-source').textContent = p.sourceId ?? NONE;
  byId('draft-risk').textContent = typeof p.risk === 'number' ? `${Math.round(p.risk * 100)} %` : NONE;
  showFlags(p.flags || []);
  const decided = byId('draft-decided');
  const v = p.verdict;
  decided.hidden = !v;
  if (v) {
    decided.dataset.verdict = v.verdict;
    const by = [v.validator ? `by ${v.validator}` : '', v.createdAt ? `at ${timeOfDay(v.createdAt)}` : ''].join(' ').trim();
    decided.replaceChildren(`${STATES[v.verdict]?.label || v.verdict}: ${review.reasonLabel(v.verdict, v.reasonCode)}`,
      v.comment ? ` “${v.comment}”` : '', by ? el('span', { className: 'decided-by' }, by) : '');
  }
}

// How a measured value reads: its words and its unit.
const VALUE_WORDS = {
  share: ['share along it', '%'], hausdorffMetres: ['farthest apart', 'm'], alongMetres: ['length along it', 'm'],
  gapMetres: ['gap', 'm'], angleDegrees: ['angle', '°'], totalMetres: ['total length', 'm'], drafts: ['drafts', ''],
  crossings: ['crossings', ''], count: ['count', ''], shortestMetres: ['shortest', 'm'], turnDegrees: ['sharpest turn', '°'],
  lengthMetres: ['length', 'm'], areaSquareMetres: ['area', 'm²'], overlapSquareMetres: ['overlap', 'm²'],
  overlapShare: ['overlap share', '%'], insideMetres: ['inside the building', 'm'],
};

function valueText(name, value) {
  const [words, unit] = VALUE_WORDS[name] || [name, ''];
  if (value === null || value === undefined) return `${words} ${NONE}`;
  if (unit === '%') return `${words} ${Math.round(value * 100)} %`;
  const shown = Math.abs(value) >= 100 || Number.isInteger(value) ? Math.round(value) : value.toFixed(1);
  return `${words} ${shown}${unit ? ` ${unit}` : ''}`;
}

/** Lists what the automated checks found on the current draft. */
function showFlags(flags) {
  const list = byId('draft-flags');
  if (!flags.length) {
    list.replaceChildren(el('li', { className: 'flag flag-none muted' }, 'Nothing found'));
    return;
  }
  list.replaceChildren(...flags.map((flag) => {
    const values = Object.entries(flag.values || {}).map(([name, value]) => valueText(name, value)).join(', ');
    const other = flag.otherLayer ? ` (${flag.otherLayer === 'reference' ? 'mapped' : 'draft'} ${flag.otherId ?? ''})`.replace(' )', ')') : '';
    return el('li', { className: 'flag', dataset: { code: flag.code } },
      el('span', { className: 'flag-label' }, flag.label || flag.code),
      values || other ? el('span', { className: 'flag-values' }, `${values}${other}`) : null);
  }));
}

function reasonItem(reason, onPick) {
  const id = `reason-${reason.verdict}-${reason.code}`.replace(/[^\w-]/g, '_');
  const input = el('input', { type: 'radio', name: 'reason', id, value: reason.code });
  input.addEventListener('change', () => onPick(reason.code));
  return el('div', { className: 'reason' }, input,
    el('label', { for: id },
      reason.number ? el('kbd', {}, String(reason.number)) : null,
      el('span', { className: 'reason-label' }, reason.label),
      reason.description ? el('span', { className: 'reason-text' }, reason.description) : null));
}

/** Shows the chosen verdict and reason (`choice` may be null). */
export function showChoice(review, choice, onPick) {
  for (const button of byId('verdict-buttons').children) {
    button.setAttribute('aria-pressed', String(choice?.verdict === button.dataset.verdict));
  }
  const list = byId('reason-list');
  const verdict = choice?.verdict || '';
  if (list.dataset.verdict !== verdict) {
    // Rebuilt only when the verdict changes, so a focused reason keeps its focus.
    list.dataset.verdict = verdict;
    list.replaceChildren(...(choice ? review.reasonsFor(verdict) : []).map((r) => reasonItem(r, onPick)));
  }
  const inside = list.contains(document.activeElement);
  for (const input of list.querySelectorAll('input')) {
    input.checked = input.value === choice?.reasonCode;
    if (input.checked && inside) input.focus(); // a radio group keeps focus on its checked radio
  }
  byId('reasons').hidden = !choice;
  byId('amend-hint').hidden = choice?.verdict !== 'AMEND';
  byId('record').disabled = !(choice && choice.reasonCode);
}

/** Puts focus where Enter records (the chosen reason, else the first one) and brings all reasons into view. */
export function focusReasons() {
  const radio = byId('reason-list').querySelector('input:checked') || byId('reason-list').querySelector('input');
  if (!radio) {
    byId('record').focus();
    return;
  }
  radio.focus({ preventScroll: true });
  byId('reasons').scrollIntoView({ block: 'nearest' });
}

export const status = (text, kind) => say(byId('review-status'), text, kind);
