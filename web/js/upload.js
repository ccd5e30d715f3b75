// Upload: a CSV file (drop or chooser) or cells pasted from a spreadsheet. The server's dry run
// (POST /api/series/preview) reads it first; the preview shows every line with its problems,
// and Save sends the same text to POST /api/series. Its progress bar follows the bytes sent and then
// the server's own report (GET /api/upload-progress/{key}): rows read, series checked, series stored.
import { get, post, postWithProgress } from './api.js';
import { byId, el, fill, say } from './dom.js';

let pending = null; // { text, contentType, delimiter }

export function showUpload() {
  reset();
}

function reset() {
  pending = null;
  byId('preview').hidden = true;
  byId('upload-progress-row').hidden = true;
  byId('paste-input').value = '';
  byId('file-input').value = '';
  say(byId('upload-message'), '');
}

function query(delimiter) {
  const params = new URLSearchParams({ missing: byId('upload-missing').value });
  const name = byId('upload-name').value.trim();
  if (name) params.set('name', name);
  if (delimiter) params.set('delimiter', delimiter);
  return params.toString();
}

async function preview(text, source) {
  const delimiter = text.includes('\t') ? 'tab' : null;
  pending = { text, contentType: delimiter ? 'text/tab-separated-values' : 'text/csv', delimiter };
  say(byId('upload-message'), `Reading ${source}…`);
  try {
    const answer = await post(`/api/series/preview?${query(delimiter)}`, text, pending.contentType);
    showPreview(text, delimiter, answer);
    say(byId('upload-message'), answer.acceptable ? `${source} reads cleanly. Check the preview, then save.`
      : `${source} has ${answer.problems.length} problem(s); they are marked below. Fix them and read it again.`,
    answer.acceptable ? 'ok' : 'error');
  } catch (error) {
    byId('preview').hidden = true;
    say(byId('upload-message'), error.message, 'error');
  }
}

function showPreview(text, delimiter, answer) {
  const caveat = answer.acceptable || answer.series.length === 0 ? null
    : el('p', {}, 'What the rest of the data reads as, leaving out the marked lines:');
  fill(byId('preview-summary'), caveat, answer.series.length === 0 ? null : el('ul', { class: 'notes' },
    answer.series.map((s) => el('li', {}, el('strong', {}, s.name), `: ${s.frequency} (${s.periodsPerYear} per year), `,
      `${s.observationCount} observations, ${s.observations[0]?.period ?? ''} to ${s.observations.at(-1)?.period ?? ''}`))));
  const byLine = new Map();
  for (const problem of answer.problems) {
    const key = problem.line ?? 0;
    byLine.set(key, [...(byLine.get(key) || []), problem]);
  }
  const lines = text.replace(/\r/g, '').split('\n');
  while (lines.length && lines.at(-1).trim() === '') lines.pop();
  const rows = lines.map((line, i) => lineRow(i + 1, splitCells(line, delimiter), byLine.get(i + 1)));
  const general = byLine.get(0) || [];
  const generalRows = general.map((p) => el('tr', { class: 'problem' }, el('th', { scope: 'row' }, '—'),
    el('td', { colspan: 2 }, problemText(p))));
  fill(byId('preview-table').tBodies[0], generalRows, rows);
  byId('upload-save').disabled = !answer.acceptable;
  byId('preview').hidden = false;
}

function splitCells(line, delimiter) {
  const separator = delimiter === 'tab' ? '\t' : (line.includes(';') && !line.includes(',') ? ';' : ',');
  return line.split(separator);
}

function lineRow(number, cells, problems) {
  const marked = problems && problems.length > 0;
  return el('tr', { class: marked ? 'problem' : null },
    el('th', { scope: 'row', class: 'num' }, String(number)),
    el('td', { class: 'cells' }, cells.map((c, i) => el('span', { class: problemAt(problems, i + 1) ? 'cell bad-cell' : 'cell' }, c))),
    el('td', {}, marked ? problems.map(problemText) : ''));
}

function problemAt(problems, column) {
  return (problems || []).some((p) => p.column === column);
}

function problemText(p) {
  return el('span', { class: 'problem-text' }, el('span', { 'aria-hidden': 'true' }, '✗ '),
    `Problem${p.column ? ` in column ${p.column}` : ''}: ${p.detail}`);
}

/** A random key naming this upload's progress on the server (32 hex digits). */
function progressKey() {
  const bytes = new Uint8Array(16);
  crypto.getRandomValues(bytes);
  return Array.from(bytes, (b) => b.toString(16).padStart(2, '0')).join('');
}

/** What the server says it is doing, in words. */
function describe(state) {
  switch (state.phase) {
    case 'receiving': return `Reading rows: ${state.rowsRead.toLocaleString('en')} read`;
    case 'checking': return `Checking series ${state.seriesChecked} of ${state.seriesTotal}`;
    case 'storing': return `Storing series ${state.seriesStored} of ${state.seriesTotal}`;
    case 'done': return `Stored ${state.seriesTotal} series`;
    default: return 'The server refused the upload';
  }
}

const pause = (ms) => new Promise((resolve) => { setTimeout(resolve, ms); });

/**
 * Polls the server's progress of the upload until stop() is called. A 404 means the server has not
 * started on it yet (or, behind several instances, another instance handles it): the bar then keeps
 * showing the bytes sent.
 */
function followServer(key, show) {
  let running = true;
  (async () => {
    while (running) {
      try {
        const state = await get(`/api/upload-progress/${encodeURIComponent(key)}`);
        if (running && state.phase !== 'failed') show(state.percent, describe(state));
      } catch {
        // Not known (yet) on this instance: the bytes sent still move the bar.
      }
      await pause(200);
    }
  })();
  return () => { running = false; };
}

async function save() {
  if (!pending) return;
  byId('upload-save').disabled = true;
  byId('upload-progress-row').hidden = false;
  const bar = byId('upload-progress');
  let shown = 0;
  const show = (percent, text) => {
    if (percent < shown) return; // the byte count and the server's report may arrive out of order
    shown = percent;
    bar.value = Math.round(percent);
    byId('upload-progress-text').textContent = `${bar.value}% – ${text}`;
  };
  show(0, 'Sending the file');
  const key = progressKey();
  const stop = followServer(key, show);
  try {
    const answer = await postWithProgress(`/api/series?${query(pending.delimiter)}&progress=${key}`, pending.text,
      pending.contentType, (fraction) => show(fraction * 40, 'Sending the file'));
    stop();
    shown = 0;
    show(100, `${answer.series.length} series saved`);
    const created = answer.series;
    location.hash = created.length === 1 ? `#/series/${created[0].id}` : '#/';
  } catch (error) {
    stop();
    byId('upload-save').disabled = false;
    say(byId('upload-message'), error.message, 'error');
  }
}

async function readFile(file) {
  if (!file) return;
  preview(await file.text(), file.name);
}

const zone = byId('drop-zone');
zone.addEventListener('dragover', (e) => { e.preventDefault(); zone.classList.add('dragging'); });
zone.addEventListener('dragleave', () => zone.classList.remove('dragging'));
zone.addEventListener('drop', (e) => {
  e.preventDefault();
  zone.classList.remove('dragging');
  readFile(e.dataTransfer.files[0]);
});
byId('file-input').addEventListener('change', (e) => readFile(e.target.files[0]));
byId('paste-preview').addEventListener('click', () => {
  const text = byId('paste-input').value;
  if (text.trim()) preview(text, 'The pasted data');
  else say(byId('upload-message'), 'Paste some cells first.', 'error');
});
byId('upload-save').addEventListener('click', save);
byId('upload-cancel').addEventListener('click', reset);
