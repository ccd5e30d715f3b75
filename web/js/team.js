// Members (admin) and the member's own API tokens, against the team API.
import { ApiError, get, patch, post, remove } from './api.js';
import { byId, el, fill, say } from './dom.js';
import { member, teamAvailable } from './session.js';

const ROLES = ['viewer', 'editor', 'admin'];

function unavailable(region) {
  say(region, 'This server has no team sign-in, so there are no members or tokens to manage.', 'info');
}

export async function showMembers() {
  const message = byId('members-message');
  say(message, '');
  if (!teamAvailable()) { unavailable(message); fill(byId('members-table').tBodies[0]); return; }
  try {
    const answer = await get('/api/members');
    const list = answer.items;
    fill(byId('members-table').tBodies[0], list.map(memberRow));
  } catch (error) {
    say(message, error instanceof ApiError && error.status === 403 ? 'Only an admin can manage members.' : error.message, 'error');
  }
}

function memberRow(m) {
  const select = el('select', { 'aria-label': `Role of ${m.username}` }, ROLES.map((r) => el('option', { value: r, selected: r === m.role }, r)));
  select.addEventListener('change', () => act(() => patch(`/api/members/${m.id}`, { role: select.value }), `${m.username} is now ${select.value}.`));
  const removeButton = el('button', { type: 'button', class: 'small danger', disabled: member()?.id === m.id }, `Remove ${m.username}`);
  removeButton.addEventListener('click', () => {
    if (window.confirm(`Remove ${m.username}? Their sessions and tokens stop working.`)) {
      act(() => remove(`/api/members/${m.id}`), `${m.username} was removed.`);
    }
  });
  return el('tr', {}, el('th', { scope: 'row' }, m.username), el('td', {}, select), el('td', {}, removeButton));
}

async function act(work, done) {
  const message = byId('members-message');
  try {
    await work();
    await showMembers();
    say(message, done, 'ok');
  } catch (error) {
    say(message, error.message, 'error');
  }
}

byId('member-form').addEventListener('submit', (e) => {
  e.preventDefault();
  const username = byId('member-username').value;
  act(() => post('/api/members', { username, password: byId('member-password').value, role: byId('member-role').value }),
    `${username} was added.`).then(() => { byId('member-form').reset(); });
});

export async function showTokens() {
  const message = byId('tokens-message');
  say(message, '');
  byId('new-token-row').hidden = true;
  if (!teamAvailable()) { unavailable(message); fill(byId('tokens-table').tBodies[0]); return; }
  try {
    const answer = await get('/api/tokens');
    const list = answer.items.filter((t) => !t.revokedAt);
    fill(byId('tokens-table').tBodies[0], list.map(tokenRow));
  } catch (error) {
    say(message, error.message, 'error');
  }
}

function tokenRow(t) {
  const button = el('button', { type: 'button', class: 'small danger' }, `Revoke ${t.name ?? t.id}`);
  button.addEventListener('click', async () => {
    try {
      await remove(`/api/tokens/${t.id}`);
      await showTokens();
      say(byId('tokens-message'), 'Token revoked.', 'ok');
    } catch (error) {
      say(byId('tokens-message'), error.message, 'error');
    }
  });
  return el('tr', {}, el('th', { scope: 'row' }, t.name ?? String(t.id)), el('td', {}, t.scope),
    el('td', {}, t.createdAt ? new Date(t.createdAt).toLocaleString() : '—'), el('td', {}, button));
}

byId('token-form').addEventListener('submit', async (e) => {
  e.preventDefault();
  try {
    const made = await post('/api/tokens', { name: byId('token-name').value, scope: byId('token-scope').value });
    await showTokens();
    byId('new-token').value = made.token;
    byId('new-token-row').hidden = false;
    byId('token-form').reset();
    byId('new-token').focus();
    byId('new-token').select();
  } catch (error) {
    say(byId('tokens-message'), error.message, 'error');
  }
});

byId('copy-token').addEventListener('click', async () => {
  try {
    await navigator.clipboard.writeText(byId('new-token').value);
    say(byId('tokens-message'), 'Token copied.', 'ok');
  } catch {
    byId('new-token').select();
  }
});
