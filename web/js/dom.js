// Small DOM helpers. Every value that comes from the server is put in as text (textContent),
// never parsed as HTML, so a series named "<img onerror=...>" stays inert.

/** Creates an element: el('td', {class: 'num'}, 'text', childNode, ...). Attributes are set one by one. */
export function el(tag, attributes = {}, ...children) {
  const node = document.createElement(tag);
  for (const [name, value] of Object.entries(attributes)) {
    if (value === false || value === null || value === undefined) continue;
    if (name === 'class') node.className = value;
    else if (name === 'text') node.textContent = value;
    else node.setAttribute(name, value === true ? '' : String(value));
  }
  append(node, children);
  return node;
}

function append(node, children) {
  for (const child of children.flat()) {
    if (child === null || child === undefined || child === false) continue;
    node.append(child instanceof Node ? child : document.createTextNode(String(child)));
  }
}

/** Replaces the children of a node. */
export function fill(node, ...children) {
  node.replaceChildren();
  append(node, children);
  return node;
}

export const byId = (id) => document.getElementById(id);

/** A number for display: fixed significant digits, a dash for null. */
export function num(value, digits = 4) {
  if (value === null || value === undefined || Number.isNaN(value)) return '—';
  const abs = Math.abs(value);
  if (abs !== 0 && (abs >= 1e6 || abs < 1e-3)) return value.toExponential(2);
  return Number(value.toPrecision(digits)).toLocaleString('en-US', { maximumFractionDigits: 6 });
}

export function pValue(p) {
  if (p === null || p === undefined) return '—';
  return p < 0.0001 ? '< 0.0001' : p.toFixed(4);
}

/** Shows a message in a live region; kind is 'info', 'ok' or 'error'. */
export function say(region, text, kind = 'info') {
  region.textContent = text;
  region.dataset.kind = kind;
  region.hidden = !text;
}

/** A status badge: the state in words and an icon, the colour only as a third cue. */
export function badge(ok, okText, badText) {
  return el('span', { class: ok ? 'badge badge-ok' : 'badge badge-warn' },
    el('span', { class: 'badge-icon', 'aria-hidden': 'true', text: ok ? '✓' : '!' }), ok ? okText : badText);
}

/** Saves a Blob under a file name. */
export function download(blob, name) {
  const url = URL.createObjectURL(blob);
  const link = el('a', { href: url, download: name, hidden: true });
  document.body.append(link);
  link.click();
  link.remove();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}

/**
 * The verdict of a test as a badge. For most checks (serial correlation, breaks) the null
 * hypothesis is the good case, so a rejection is a warning; for a unit-root test the null is the
 * troublesome case, so a rejection is fine.
 */
export function verdict(test) {
  const rejected = test.decision === 'reject';
  const nullIsTrouble = /dickey-fuller|unit root/i.test(`${test.test} ${test.nullHypothesis}`);
  const what = `${rejected ? 'rejected' : 'not rejected'} at ${Math.round(test.level * 100)}%`;
  return badge(rejected === nullIsTrouble, `Fine (${what})`, `Warning (${what})`);
}
