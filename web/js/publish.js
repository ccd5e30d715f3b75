// Publishing a brief (team API: POST /api/series/{id}/briefs) and copying its link.
import { ApiError, post } from './api.js';
import { byId, say } from './dom.js';

export async function publishBrief(current, request) {
  const message = byId('publish-message');
  const { detail } = current;
  try {
    const brief = await post(`/api/series/${detail.id}/briefs`, {
      version: detail.version, model: request.model, horizon: request.horizon, levels: request.levels,
      note: byId('brief-note').value,
    });
    const link = new URL(brief.url, location.origin).href;
    byId('brief-link').value = link;
    byId('open-brief').href = link;
    byId('brief-link-row').hidden = false;
    say(message, 'Published. Anyone with the link can read the brief.', 'ok');
  } catch (error) {
    const text = error instanceof ApiError && error.status === 404 && !error.problem?.detail?.includes('series')
      ? 'This server cannot publish briefs yet (no brief endpoint).' : error.message;
    say(message, text, 'error');
  }
}

async function copyLink() {
  const field = byId('brief-link');
  try {
    await navigator.clipboard.writeText(field.value);
    say(byId('publish-message'), 'Link copied.', 'ok');
  } catch {
    field.select();
    say(byId('publish-message'), 'Press Ctrl+C (or ⌘C) to copy the selected link.', 'info');
  }
}

byId('copy-link').addEventListener('click', copyLink);
