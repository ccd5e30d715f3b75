// The list of series: search by name, frequency, length, periods, last update and a sparkline.
import { get } from './api.js';
import { byId, el, fill } from './dom.js';
import { sparkline } from './charts.js';

let all = [];

export async function showList() {
  const answer = await get('/api/series');
  all = answer.series;
  render();
}

function render() {
  const query = byId('series-search').value.trim().toLowerCase();
  const shown = all.filter((s) => s.name.toLowerCase().includes(query));
  const body = byId('series-table').tBodies[0];
  fill(body, shown.map(row));
  byId('list-empty').hidden = all.length > 0;
  shown.forEach((s) => drawSparkline(s));
}

function row(s) {
  return el('tr', {},
    el('td', {}, el('a', { href: `#/series/${s.id}`, class: 'series-link' }, s.name)),
    el('td', {}, s.frequency),
    el('td', { class: 'num' }, String(s.observations)),
    el('td', {}, `${s.firstPeriod} – ${s.lastPeriod}`),
    el('td', {}, el('time', { datetime: s.updatedAt }, new Date(s.updatedAt).toLocaleString())),
    el('td', {}, el('canvas', { width: 120, height: 28, id: `spark-${s.id}`, role: 'img', 'aria-label': `Shape of ${s.name}` })));
}

const values = new Map();

async function drawSparkline(s) {
  const key = `${s.id}/${s.version}`;
  if (!values.has(key)) {
    const detail = await get(`/api/series/${s.id}/versions/${s.version}`);
    values.set(key, detail.observations.map((o) => o.value));
  }
  const canvas = byId(`spark-${s.id}`);
  if (canvas) sparkline(canvas, values.get(key));
}

byId('series-search').addEventListener('input', render);
