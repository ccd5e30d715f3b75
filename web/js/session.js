// The signed-in member, against the team API: GET/POST/DELETE /api/session. A server without
// team sign-in answers 404 there; the page then runs open, without the team screens.
import { ApiError, get, post, remove, setCsrfToken } from './api.js';
import { byId, say } from './dom.js';

let state = { available: false, member: null };

export const needsSignIn = () => state.available && !state.member;
export const member = () => state.member;
export const teamAvailable = () => state.available;

export async function load() {
  try {
    accept(await get('/api/session'));
  } catch (error) {
    if (!(error instanceof ApiError)) throw error;
    state = { available: error.status !== 404, member: null };
  }
  render();
}

function accept(answer) {
  state = { available: true, member: answer.member };
  setCsrfToken(answer.csrfToken);
}

function render() {
  document.body.classList.toggle('no-team', !state.available);
  byId('session-user').textContent = state.member ? `${state.member.username} (${state.member.role})` : '';
  byId('sign-out').hidden = !state.member;
}

export function showSignIn() {
  byId('signin-username').focus();
}

async function signIn(event) {
  event.preventDefault();
  const message = byId('signin-message');
  try {
    accept(await post('/api/session', { username: byId('signin-username').value, password: byId('signin-password').value }));
    byId('signin-password').value = '';
    say(message, '');
    render();
    location.hash = '#/';
  } catch (error) {
    say(message, error.status === 401 ? 'That user name and password do not match.' : error.message, 'error');
  }
}

async function signOut() {
  try {
    await remove('/api/session');
  } finally {
    state = { available: true, member: null };
    setCsrfToken(null);
    render();
    location.hash = '#/signin';
  }
}

byId('signin-form').addEventListener('submit', signIn);
byId('sign-out').addEventListener('click', signOut);
