// The lead's page across batches: each batch they run with its progress and forecast, the
// team's drafts per day by batch, and each validator's recent work. Refreshes every 30 s.

import { get } from './api.js';
import { byId, el, say } from './dom.js';
import { chart, tableView } from './figures.js';
import { showSignedIn } from './session.js';
import { OKABE_ITO } from './styles.js';

const zone = Intl.DateTimeFormat().resolvedOptions().timeZone || 'UTC';
const number = new Intl.NumberFormat();
const SERIES = [OKABE_ITO.blue, OKABE_ITO.orange, OKABE_ITO.reddishPurple, OKABE_ITO.skyBlue,
  OKABE_ITO.vermillion, OKABE_ITO.bluishGreen, OKABE_ITO.black, OKABE_ITO.yellow];
const STATE_NAMES = { OPEN: 'Open', PAUSED: 'Paused', CLOSED: 'Closed' };

const when = (iso) => (iso ? new Date(iso).toLocaleString([], { dateStyle: 'medium', timeStyle: 'short', timeZone: zone }) : 'not foreseeable');

async function refresh() {
  try {
    const view = await get(`api/overview?zone=${encodeURIComponent(zone)}`);
    byId('overview-batches').tBodies[0].replaceChildren(...view.batches.map((b) => el('tr', {},
      el('th', { scope: 'row' }, el('a', { href: `lead.html?batch=${encodeURIComponent(b.id)}` }, b.name)),
      el('td', {}, STATE_NAMES[b.state] || b.state),
      el('td', {}, `${number.format(b.decided)} of ${number.format(b.drafts)}`),
      el('td', {}, number.format(b.open)),
      el('td', {}, `${number.format(b.cellsFinished)} of ${number.format(b.cells)}`),
      el('td', {}, number.format(b.decidedToday)),
      el('td', {}, number.format(b.pacePerDay)),
      el('td', {}, b.open === 0 ? 'done' : when(b.expected)))));
    const daily = view.tables.daily;
    chart('chart-team', {
      type: 'bar',
      data: {
        labels: daily.rows.map((r) => r[0]),
        datasets: daily.columns.slice(2).map((name, i) => ({ label: name, data: daily.rows.map((r) => r[i + 2]), backgroundColor: SERIES[i % SERIES.length] })),
      },
      options: { scales: { x: { stacked: true }, y: { stacked: true, beginAtZero: true, title: { display: true, text: 'drafts decided' } } } },
    });
    const csv = (name) => `api/overview/${name}.csv?zone=${encodeURIComponent(zone)}`;
    tableView(byId('table-daily'), daily, 'Drafts per day and batch', csv('daily'));
    tableView(byId('table-validators'), view.tables.validators, 'Validators across batches', csv('validators'));
    byId('refreshed').textContent = `Updated ${new Date(view.generatedAt).toLocaleTimeString([], { timeZone: zone })} (${zone}).`;
    say(byId('overview-status'), '');
    document.body.dataset.loaded = 'true';
  } catch (e) {
    say(byId('overview-status'), e.message, 'error');
  }
}

async function start() {
  await showSignedIn();
  await refresh();
  setInterval(() => {
    if (document.visibilityState === 'visible') refresh();
  }, 30000);
}

start().catch((e) => say(byId('overview-status'), e.message, 'error'));
