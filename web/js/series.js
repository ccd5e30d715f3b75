// The series view: model controls, the charts, diagnostics, coefficients, the forecast table
// with its exports, the model comparison and publishing a brief. Results update in place.
import { get, post } from './api.js';
import { badge, byId, download, el, fill, num, pValue, say, verdict } from './dom.js';
import { autocorrelationChart, forecastChart, png, residualChart } from './charts.js';
import { publishBrief } from './publish.js';

let current = null; // { detail, fit }

export async function showSeries(id) {
  byId('results').hidden = true;
  byId('brief-link-row').hidden = true;
  say(byId('publish-message'), '');
  const detail = await get(`/api/series/${id}`);
  current = { detail, fit: null };
  byId('series-title').textContent = detail.name;
  byId('series-facts').textContent = `${detail.frequency}, ${detail.observationCount} observations, `
    + `${detail.firstPeriod} to ${detail.lastPeriod}, version ${detail.version}`;
  document.title = `${detail.name} – Trendwright`;
  await fit();
  compare();
}

/** The model spec and fit request the controls describe. */
export function fitRequest() {
  const family = byId('m-family').value;
  const model = family === 'trend' ? {
    family, shape: byId('m-shape').value, scale: byId('m-scale').value, seasonal: byId('m-seasonal').checked,
    errors: byId('m-errors').value,
  } : {
    family, order: Number(byId('m-order').value || 0), selection: byId('m-selection').value,
    differenced: byId('m-differenced').checked, seasonalLag: byId('m-seasonal-lag').checked,
  };
  const hacLag = byId('m-haclag').value;
  if (family === 'trend' && model.errors === 'newey-west' && hacLag !== '') model.hacLag = Number(hacLag);
  const levels = byId('m-levels').value.split(/[,\s]+/).filter(Boolean).map((v) => Number(v) / 100);
  return { model, horizon: Number(byId('m-horizon').value || 8), levels };
}

function syncControls() {
  const trend = byId('m-family').value === 'trend';
  document.querySelectorAll('.trend-only').forEach((n) => { n.hidden = !trend; });
  document.querySelectorAll('.ar-only').forEach((n) => { n.hidden = trend; });
  byId('m-haclag').disabled = byId('m-errors').value !== 'newey-west';
}

async function fit() {
  const { detail } = current;
  const message = byId('fit-message');
  say(message, 'Fitting…');
  byId('fit-button').disabled = true;
  try {
    const answer = await post(`/api/series/${detail.id}/versions/${detail.version}/fit`, fitRequest());
    current.fit = answer;
    render(answer);
    say(message, '');
  } catch (error) {
    say(message, error.message, 'error');
  } finally {
    byId('fit-button').disabled = false;
  }
}

function render(answer) {
  byId('results').hidden = false;
  byId('model-description').textContent = answer.description;
  drawCharts();
  renderDiagnostics(answer);
  renderCoefficients(answer.coefficients);
  renderForecast(answer);
  byId('results').dataset.fitted = `${answer.model.family}:${JSON.stringify(answer.model)}`;
}

function drawCharts() {
  const chart = current.fit.chart;
  forecastChart(byId('forecast-chart'), chart, byId('log-scale').checked);
  residualChart(byId('residual-chart'), chart);
  const none = chart.autocorrelations.length === 0;
  byId('acf-empty').hidden = !none;
  byId('acf-chart').parentElement.hidden = none;
  if (!none) autocorrelationChart(byId('acf-chart'), chart);
}

function renderDiagnostics(answer) {
  fill(byId('diagnostics-table').tBodies[0], answer.tests.map((t) => el('tr', {},
    el('th', { scope: 'row' }, t.test),
    el('td', { class: 'num' }, num(t.statistic)),
    el('td', { class: 'num' }, pValue(t.pValue)),
    el('td', {}, verdict(t)),
    el('td', {}, t.reading))));
  fill(byId('fit-notes'), answer.notes.map((n) => el('li', {}, n)));
}

function renderCoefficients(rows) {
  fill(byId('coefficient-table').tBodies[0], rows.map((c) => el('tr', {},
    el('th', { scope: 'row' }, c.name), el('td', { class: 'num' }, num(c.estimate)),
    el('td', { class: 'num' }, num(c.standardError)), el('td', { class: 'num' }, num(c.tStatistic, 3)),
    el('td', { class: 'num' }, pValue(c.pValue)), el('td', { class: 'num' }, `${num(c.lower95)} to ${num(c.upper95)}`))));
}

function levelName(level) {
  return `${Math.round(level * 100)}%`;
}

function renderForecast(answer) {
  const table = byId('forecast-table');
  fill(table.tHead, el('tr', {}, el('th', { scope: 'col' }, 'Period'), el('th', { scope: 'col', class: 'num' }, 'Forecast'),
    answer.levels.map((l) => el('th', { scope: 'col', class: 'num' }, `${levelName(l)} interval`))));
  fill(table.tBodies[0], answer.forecast.map((r) => el('tr', {},
    el('th', { scope: 'row' }, r.period), el('td', { class: 'num' }, num(r.value, 5)),
    r.intervals.map((i) => el('td', { class: 'num' }, `${num(i.lower, 5)} to ${num(i.upper, 5)}`)))));
}

/** The forecast as CSV: period, forecast, then lower and upper bound per level. */
export function forecastCsv(answer) {
  const quote = (text) => `"${String(text).replace(/"/g, '""')}"`;
  const header = ['period', 'forecast', ...answer.levels.flatMap((l) => [`lower_${levelName(l)}`, `upper_${levelName(l)}`])];
  const lines = answer.forecast.map((r) => [quote(r.period), r.value, ...r.intervals.flatMap((i) => [i.lower, i.upper])].join(','));
  return `${header.join(',')}\n${lines.join('\n')}\n`;
}

function fileBase() {
  return current.detail.name.replace(/[^A-Za-z0-9_-]+/g, '_').slice(0, 60) || 'series';
}

async function compare() {
  const { detail } = current;
  const message = byId('compare-message');
  say(message, 'Comparing candidate models on held-out periods…');
  const holdout = byId('m-holdout').value;
  try {
    const answer = await post(`/api/series/${detail.id}/versions/${detail.version}/comparison`,
      holdout ? { holdout: Number(holdout) } : {});
    renderComparison(answer);
    say(message, answer.noCandidatePasses ? 'No candidate passes every residual check: treat every interval with care.' : '',
      answer.noCandidatePasses ? 'error' : 'info');
  } catch (error) {
    fill(byId('comparison-table').tBodies[0]);
    fill(byId('comparison-reasons'));
    say(message, error.message, 'error');
  }
}

function renderComparison(answer) {
  fill(byId('comparison-table').tBodies[0], answer.candidates.map((c) => el('tr', { class: c.recommended ? 'recommended' : null },
    el('th', { scope: 'row' }, c.name),
    c.failure ? el('td', { colspan: 6 }, `Could not be fitted: ${c.failure}`) : [
      el('td', { class: 'num' }, num(c.holdout?.rmse)), el('td', { class: 'num' }, num(c.holdout?.mae)),
      el('td', { class: 'num' }, c.holdout?.mape == null ? '—' : `${num(c.holdout.mape, 3)}%`),
      el('td', { class: 'num' }, num(c.rollingOrigin?.rmse)), el('td', { class: 'num' }, num(c.aic, 5)), el('td', { class: 'num' }, num(c.bic, 5))],
    el('td', {}, c.failure ? '—' : badge(c.passesChecks, `${c.checksPassed} of ${c.residualChecks.length} passed`,
      `${c.checksPassed} of ${c.residualChecks.length} passed`)),
    el('td', {}, c.recommended ? el('span', { class: 'badge badge-best' }, el('span', { 'aria-hidden': 'true' }, '★ '), 'Recommended') : ''))));
  fill(byId('comparison-reasons'), answer.reasons.map((r) => el('li', {}, r)));
}

byId('model-form').addEventListener('submit', (e) => { e.preventDefault(); fit(); });
byId('model-form').addEventListener('change', (e) => {
  syncControls();
  if (e.target.id === 'log-scale') { if (current?.fit) drawCharts(); return; }
  if (e.target.id === 'm-holdout') { compare(); return; }
  if (current) fit();
});
byId('compare-button').addEventListener('click', compare);
byId('export-csv').addEventListener('click', () => download(new Blob([forecastCsv(current.fit)], { type: 'text/csv' }), `${fileBase()}-forecast.csv`));
byId('export-json').addEventListener('click', () => download(new Blob([JSON.stringify({
  series: current.fit.series, model: current.fit.model, levels: current.fit.levels, forecast: current.fit.forecast,
}, null, 2)], { type: 'application/json' }), `${fileBase()}-forecast.json`));
document.querySelectorAll('[data-png]').forEach((button) => button.addEventListener('click', async () => {
  download(await png(byId(button.dataset.png)), `${fileBase()}-${button.dataset.png}.png`);
}));
byId('publish-button').addEventListener('click', () => publishBrief(current, fitRequest()));
syncControls();
