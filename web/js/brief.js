// The public brief (no sign-in): reads /api/public/briefs/{token} and shows the frozen chart,
// the forecast table, the key checks in plain words, the author's note and the tracking of
// actuals that arrived since publication. Every value is inserted as text.
import { get } from './api.js';
import { badge, byId, el, fill, num, say, verdict } from './dom.js';
import { forecastChart } from './charts.js';

function token() {
  const parts = location.pathname.split('/').filter(Boolean);
  return parts[0] === 'b' && parts[1] ? decodeURIComponent(parts[1]) : new URLSearchParams(location.search).get('token');
}

const results = (brief) => brief.results || {};
const chartOf = (brief) => brief.chart || results(brief).chart;
const levelName = (level) => `${Math.round(level * 100)}%`;

function header(brief) {
  const series = brief.series || results(brief).series || {};
  byId('brief-title').textContent = series.name ? `Forecast: ${series.name}` : 'Forecast brief';
  document.title = `${byId('brief-title').textContent} – Trendwright`;
  const { author } = brief;
  const published = brief.publishedAt ? new Date(brief.publishedAt).toLocaleString() : '';
  byId('brief-byline').textContent = [author ? `Published by ${author}` : 'Published', published ? `on ${published}` : '',
    series.version ? `(data version ${series.version})` : ''].filter(Boolean).join(' ');
  // supersededBy is the newer brief's link, and only when that brief is shared.
  if (typeof brief.supersededBy === 'string' && brief.supersededBy.startsWith('/b/')) {
    byId('brief-newer').href = brief.supersededBy;
    byId('brief-superseded').hidden = false;
  }
  byId('note-section').hidden = !brief.note;
  byId('brief-note-text').textContent = brief.note || '';
  const r = results(brief);
  byId('brief-model').textContent = r.description ? `Model: ${r.description}.` : '';
}

function forecastTable(rows, levels) {
  const table = byId('brief-forecast');
  fill(table.tHead, el('tr', {}, el('th', { scope: 'col' }, 'Period'), el('th', { scope: 'col', class: 'num' }, 'Forecast'),
    levels.map((l) => el('th', { scope: 'col', class: 'num' }, `${levelName(l)} interval`))));
  fill(table.tBodies[0], rows.map((r) => el('tr', {}, el('th', { scope: 'row' }, r.period), el('td', { class: 'num' }, num(r.value, 5)),
    r.intervals.map((i) => el('td', { class: 'num' }, `${num(i.lower, 5)} to ${num(i.upper, 5)}`)))));
}

function checks(tests) {
  fill(byId('brief-checks'), tests.map((t) => el('li', {},
    verdict(t), ' ', el('strong', {}, `${t.test}: `), t.reading)));
}

function tracking(track) {
  const section = byId('tracking-section');
  const rows = track?.periods || [];
  const table = byId('brief-tracking').closest('.table-wrap');
  table.hidden = !track || rows.length === 0;
  if (table.hidden) {
    byId('tracking-summary').textContent = 'No actuals have arrived for the forecast periods yet.';
    fill(byId('brief-tracking').tBodies[0]);
    section.hidden = false;
    return;
  }
  const { mae, mape } = track;
  byId('tracking-summary').textContent = `${rows.length} actual(s) so far. Mean absolute error ${num(mae)}`
    + (mape == null ? '.' : `, mean absolute percentage error ${num(mape, 3)}%.`);
  fill(byId('brief-tracking').tBodies[0], rows.map((r) => el('tr', {}, el('th', { scope: 'row' }, r.period),
    el('td', { class: 'num' }, num(r.forecast, 5)), el('td', { class: 'num' }, num(r.actual, 5)),
    el('td', {}, inside(r.inside80)), el('td', {}, inside(r.inside95)))));
}

/** Whether an actual fell inside an interval; null when the brief has no interval at that level. */
function inside(flag) {
  return flag === null || flag === undefined ? '—' : badge(flag, 'Inside', 'Outside');
}

/** Redraws the chart at the printed width, and back after printing. */
function printable(chart) {
  window.addEventListener('beforeprint', () => chart.resize(680, 320));
  window.addEventListener('afterprint', () => chart.resize());
}

async function start() {
  const key = token();
  try {
    if (!key) throw new Error('This address names no brief.');
    const brief = await get(`/api/public/briefs/${encodeURIComponent(key)}`);
    header(brief);
    const chart = chartOf(brief);
    const r = results(brief);
    byId('brief').hidden = false;
    if (chart) printable(forecastChart(byId('brief-chart'), chart, false));
    forecastTable(r.forecast || brief.forecast || [], r.levels || brief.levels || []);
    checks(r.tests || brief.tests || []);
    tracking(brief.tracking);
  } catch (error) {
    say(byId('brief-message'), error.status === 404 ? 'This brief does not exist or was withdrawn.' : error.message, 'error');
  }
  document.body.dataset.ready = 'true';
}

byId('print-button').addEventListener('click', () => window.print());
start();
