// First start: the one-time setup code (printed on the server's console) makes the first admin.
import { post } from './api.js';
import { byId, say } from './dom.js';

byId('setup-form').addEventListener('submit', async (e) => {
  e.preventDefault();
  const message = byId('setup-message');
  if (byId('setup-password').value !== byId('setup-password-again').value) {
    say(message, 'The two passwords differ.', 'error');
    return;
  }
  try {
    await post('/api/setup', { setupCode: byId('setup-code').value.trim(), username: byId('setup-username').value,
      password: byId('setup-password').value });
    say(message, 'Done. You are signed in as the first admin.', 'ok');
    location.assign('/');
  } catch (error) {
    say(message, error.message, 'error');
  }
});
