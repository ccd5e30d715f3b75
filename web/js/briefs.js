// The team's published briefs: GET /api/briefs (all of them, revoked ones too), GET
// /api/briefs/misses (shared briefs whose later actuals fell outside the 95% interval) and
// GET /api/series for the series' names. Every member may copy a link; editors and admins may
// revoke a brief (DELETE /api/briefs/{id}), after a confirmation. Values are inserted as text.
import { ApiError, get, remove } from './api.js';
import { badge, byId, el, fill, say } from './dom.js';
import { member, teamAvailable } from './session.js';

const when = (instant) => new Date(instant).toLocaleString();

export async function showBriefs() {
  const message = byId('briefs-message');
  say(message, '');
  const body = byId('briefs-table').tBodies[0];
  if (!teamAvailable()) {
    say(message, 'This server has no team sign-in, so it publishes no briefs.', 'info');
    fill(body);
    return;
  }
  const [briefs, misses, series] = await Promise.all([get('/api/briefs'), get('/api/briefs/misses'), get('/api/series')]);
  const names = new Map(series.series.map((s) => [s.id, s.name]));
  const missed = new Map(misses.items.map((m) => [m.brief.id, m.tracking]));
  const canRevoke = member()?.role !== 'viewer';
  byId('briefs-readonly').hidden = canRevoke;
  const newestFirst = [...briefs.items].sort((a, b) => Date.parse(b.publishedAt) - Date.parse(a.publishedAt));
  fill(body, newestFirst.map((b) => row(b, names.get(b.seriesId), missed.get(b.id), canRevoke)));
  byId('briefs-empty').hidden = newestFirst.length > 0;
}

/** The title a brief's page shows: the series' name, or its id when the series was deleted since. */
function title(seriesName, brief) {
  return seriesName === undefined ? `Forecast of deleted series ${brief.seriesId}` : `Forecast: ${seriesName}`;
}

function row(brief, seriesName, tracking, canRevoke) {
  const name = title(seriesName, brief);
  const described = `${name}, published ${when(brief.publishedAt)}`;
  const link = new URL(brief.url, location.origin).href;
  return el('tr', { 'data-brief': brief.id },
    el('th', { scope: 'row' }, el('span', { class: 'brief-name' }, name),
      el('small', { class: 'brief-series' }, `${seriesName ?? `series ${brief.seriesId} (deleted)`}, version ${brief.seriesVersion}`)),
    el('td', {}, el('time', { datetime: brief.publishedAt }, when(brief.publishedAt)),
      el('small', { class: 'brief-author' }, `by ${brief.author ?? 'a removed member'}`)),
    el('td', {}, status(brief), tracking ? [' ', missBadge(tracking)] : null),
    el('td', {}, brief.shared ? [
      el('a', { href: brief.url, target: '_blank', rel: 'noopener' }, 'Open', el('span', { class: 'visually-hidden' }, ` ${described}`)),
      ' ', copyButton(link, described)] : '—'),
    el('td', {}, canRevoke && !brief.revokedAt ? revokeButton(brief, described) : '—'));
}

function status(brief) {
  if (brief.revokedAt) return badge(false, '', `Revoked ${when(brief.revokedAt)}`);
  if (!brief.shared) return badge(false, '', `Expired ${when(brief.expiresAt)}`);
  const shared = badge(true, brief.supersededBy ? 'Shared, a newer brief exists' : 'Shared', '');
  return brief.expiresAt ? [shared, el('small', {}, `until ${when(brief.expiresAt)}`)] : shared;
}

function missBadge(tracking) {
  return badge(false, '', `${tracking.outside95} actual(s) outside the 95% interval`);
}

function copyButton(link, described) {
  const button = el('button', { type: 'button', class: 'small', 'aria-label': `Copy link to ${described}` }, 'Copy link');
  button.addEventListener('click', async () => {
    const message = byId('briefs-message');
    try {
      await navigator.clipboard.writeText(link);
      say(message, `Link copied: ${link}`, 'ok');
    } catch {
      say(message, `Copying is not allowed here; select and copy this link: ${link}`, 'info');
    }
  });
  return button;
}

function revokeButton(brief, described) {
  const button = el('button', { type: 'button', class: 'small danger', 'aria-label': `Revoke ${described}` }, 'Revoke');
  button.addEventListener('click', async () => {
    if (!window.confirm(`Revoke ${described}? Its link stops working for everybody, and this cannot be undone.`)) return;
    const message = byId('briefs-message');
    try {
      await remove(`/api/briefs/${brief.id}`);
      await showBriefs();
      say(message, `Revoked ${described}. Its link now answers that the brief was withdrawn.`, 'ok');
    } catch (error) {
      say(message, error instanceof ApiError && error.status === 403 ? 'Only editors and admins can revoke briefs.'
        : error.message, 'error');
    }
    message.focus();
  });
  return button;
}
