// Figures shown as a chart and as a table: the table folds away under its chart and offers
// the same figures as CSV. Charts are Chart.js (WebJar), updated in place on each refresh.

import { byId, el } from './dom.js';

const number = new Intl.NumberFormat();
const charts = {};

/** A table of figures with its CSV download, folded away under the chart. */
export function tableView(holder, table, title, csv) {
  const head = el('tr', {}, ...table.columns.map((c) => el('th', { scope: 'col' }, c.replaceAll('_', ' '))));
  const body = table.rows.map((row) => el('tr', {}, ...row.map((v, i) =>
    (i === 0 ? el('th', { scope: 'row' }, String(v)) : el('td', {}, typeof v === 'number' ? number.format(v) : String(v))))));
  const open = holder.querySelector('details')?.open || false;
  holder.replaceChildren(el('details', { open },
    el('summary', {}, `${title}: table (${number.format(table.rows.length)} rows)`),
    el('div', { className: 'table-scroll' }, el('table', { className: 'data-table' },
      el('caption', { className: 'visually-hidden' }, title), el('thead', {}, head), el('tbody', {}, ...body))),
    csv ? el('a', { href: csv, download: '' }, `Download ${title.toLowerCase()} as CSV`) : null));
}

/** Draws or updates a chart in place. */
export function chart(id, config) {
  const existing = charts[id];
  if (existing) {
    existing.data = config.data;
    existing.update('none');
    return;
  }
  charts[id] = new Chart(byId(id), {
    ...config,
    options: { responsive: true, maintainAspectRatio: false, animation: false, ...config.options },
  });
}

