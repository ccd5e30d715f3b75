// The page: a hash router over the views, and the session (when the server has team sign-in).
import { byId, say } from './dom.js';
import * as session from './session.js';
import { showList } from './list.js';
import { showUpload } from './upload.js';
import { showSeries } from './series.js';
import { showMembers, showTokens } from './team.js';
import { showBriefs } from './briefs.js';

const views = ['signin', 'list', 'upload', 'series', 'briefs', 'members', 'tokens'];

const routes = [
  [/^#\/?$/, 'list', () => showList()],
  [/^#\/upload$/, 'upload', () => showUpload()],
  [/^#\/series\/(\d+)$/, 'series', (m) => showSeries(Number(m[1]))],
  [/^#\/briefs$/, 'briefs', () => showBriefs()],
  [/^#\/members$/, 'members', () => showMembers()],
  [/^#\/tokens$/, 'tokens', () => showTokens()],
  [/^#\/signin$/, 'signin', () => session.showSignIn()],
];

function showView(name) {
  for (const view of views) byId(`view-${view}`).hidden = view !== name;
  for (const link of document.querySelectorAll('[data-nav]')) {
    if (link.dataset.nav === name) link.setAttribute('aria-current', 'page');
    else link.removeAttribute('aria-current');
  }
}

async function route() {
  say(byId('global-message'), '');
  const hash = location.hash || '#/';
  if (session.needsSignIn() && hash !== '#/signin') {
    location.hash = '#/signin';
    return;
  }
  for (const [pattern, view, show] of routes) {
    const match = hash.match(pattern);
    if (match) {
      showView(view);
      try {
        await show(match);
      } catch (error) {
        say(byId('global-message'), error.message, 'error');
      }
      keepFocusInView();
      return;
    }
  }
  location.hash = '#/';
}

/**
 * After a change of view, a keyboard user whose focus was on a control of the view that is now
 * hidden (or nowhere) continues from the top of the main content, not from the start of the page.
 */
function keepFocusInView() {
  const active = document.activeElement;
  if (!active || active === document.body || active.closest('[hidden]')) byId('main').focus({ preventScroll: true });
}

// Counts what the Content-Security-Policy blocked, so a test (or a person in the console) sees it.
document.addEventListener('securitypolicyviolation', (e) => {
  document.body.dataset.cspViolations = String(Number(document.body.dataset.cspViolations || 0) + 1);
  console.warn(`Blocked by the Content-Security-Policy: ${e.violatedDirective} ${e.blockedURI}`);
});

async function start() {
  await session.load();
  window.addEventListener('hashchange', route);
  await route();
  document.body.dataset.ready = 'true';
}

start();
