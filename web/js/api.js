// Calls to the Trendwright API. Writes made with the session cookie carry the CSRF token the
// sign-in returned; errors arrive as RFC 9457 problem+json and are thrown as ApiError.

let csrfToken = null;

export class ApiError extends Error {
  constructor(status, problem) {
    super(problem?.detail || problem?.title || `The server answered ${status}.`);
    this.status = status;
    this.problem = problem;
  }
}

export function setCsrfToken(token) {
  csrfToken = token;
}

function headers(method, extra) {
  const all = { Accept: 'application/json', ...extra };
  if (method !== 'GET' && csrfToken) all['X-CSRF-Token'] = csrfToken;
  return all;
}

async function readAnswer(response) {
  const type = response.headers.get('Content-Type') || '';
  const body = type.includes('json') ? await response.json() : null;
  if (!response.ok) throw new ApiError(response.status, body);
  return body;
}

/** Sends a request; body objects are sent as JSON, strings as text with the given type. */
export async function call(method, path, body, contentType) {
  const init = { method, credentials: 'same-origin', headers: headers(method, {}) };
  if (body !== undefined) {
    init.body = typeof body === 'string' ? body : JSON.stringify(body);
    init.headers['Content-Type'] = contentType || 'application/json';
  }
  return readAnswer(await fetch(path, init));
}

export const get = (path) => call('GET', path);
export const post = (path, body, type) => call('POST', path, body, type);
export const patch = (path, body) => call('PATCH', path, body);
export const remove = (path) => call('DELETE', path);

/**
 * Posts text with XMLHttpRequest so the upload's progress can be shown; onProgress gets a
 * fraction 0..1 of the bytes sent.
 */
export function postWithProgress(path, text, contentType, onProgress) {
  return new Promise((resolve, reject) => {
    const request = new XMLHttpRequest();
    request.open('POST', path);
    request.setRequestHeader('Content-Type', contentType);
    request.setRequestHeader('Accept', 'application/json');
    if (csrfToken) request.setRequestHeader('X-CSRF-Token', csrfToken);
    request.upload.addEventListener('progress', (e) => {
      if (e.lengthComputable) onProgress(e.loaded / e.total);
    });
    request.addEventListener('load', () => {
      let body = null;
      try { body = JSON.parse(request.responseText); } catch { body = null; }
      if (request.status >= 200 && request.status < 300) resolve(body);
      else reject(new ApiError(request.status, body));
    });
    request.addEventListener('error', () => reject(new ApiError(0, { detail: 'The server could not be reached.' })));
    request.send(text);
  });
}
