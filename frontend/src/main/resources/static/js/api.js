// The API client: JSON over fetch, same origin, with the CSRF header on every change.
// Errors carry the RFC 9457 problem's `detail`; a 401 sends the browser to the sign-in page.

const CSRF_COOKIE = 'XSRF-TOKEN';
const CSRF_HEADER = 'X-XSRF-TOKEN';
const TIMEOUT_MS = 20000;
const VERDICT_RETRIES = 3;

/** An answer from the server that was not a success; `problem` is the RFC 9457 body, if any. */
export class ApiError extends Error {
  constructor(message, status, problem) {
    super(message);
    this.name = 'ApiError';
    this.status = status;
    this.problem = problem;
  }
}

/** The request never got an answer (offline, timeout, connection reset). */
export class NetworkError extends Error {
  constructor(cause) {
    super('The server could not be reached.');
    this.name = 'NetworkError';
    this.cause = cause;
  }
}

function cookie(name) {
  const prefix = name + '=';
  const found = document.cookie.split('; ').find((part) => part.startsWith(prefix));
  return found ? decodeURIComponent(found.slice(prefix.length)) : null;
}

// The server sets the token cookie on any request; after sign-in it is replaced, so fetch one if missing.
async function csrfToken() {
  if (!cookie(CSRF_COOKIE)) {
    try {
      await fetch('api/me', { credentials: 'same-origin' });
    } catch (e) {
      throw new NetworkError(e);
    }
  }
  return cookie(CSRF_COOKIE);
}

async function problemOf(response) {
  const type = response.headers.get('Content-Type') || '';
  if (type.includes('json')) {
    try {
      return await response.json();
    } catch {
      return null;
    }
  }
  return null;
}

function goToSignIn() {
  const here = location.pathname.split('/').pop() + location.search;
  location.assign('signin.html?next=' + encodeURIComponent(here));
  return new Promise(() => {}); // the page is leaving; nothing after this should run
}

/**
 * Sends one request. Options: `json` (a body to send as JSON), `form` (an object sent as
 * application/x-www-form-urlencoded), `allow401` (return the 401 as an ApiError instead of
 * leaving for the sign-in page). Resolves to the parsed JSON body, or null for an empty answer.
 */
export async function request(method, path, { json, form, allow401 = false } = {}) {
  const headers = { Accept: 'application/json, application/problem+json' };
  let body;
  if (json !== undefined) {
    headers['Content-Type'] = 'application/json';
    body = JSON.stringify(json);
  } else if (form !== undefined) {
    headers['Content-Type'] = 'application/x-www-form-urlencoded';
    body = new URLSearchParams(form).toString();
  }
  if (method !== 'GET' && method !== 'HEAD') {
    const token = await csrfToken();
    if (token) headers[CSRF_HEADER] = token;
  }
  let response;
  try {
    response = await fetch(path, {
      method,
      headers,
      body,
      credentials: 'same-origin',
      signal: AbortSignal.timeout(TIMEOUT_MS),
    });
  } catch (e) {
    throw new NetworkError(e);
  }
  if (response.status === 401 && !allow401) return goToSignIn();
  if (!response.ok) {
    const problem = await problemOf(response);
    const message = (problem && (problem.detail || problem.title)) || `The server answered ${response.status}.`;
    throw new ApiError(message, response.status, problem);
  }
  if (response.status === 204) return null;
  const text = await response.text();
  return text ? JSON.parse(text) : null;
}

export const get = (path) => request('GET', path);
export const post = (path, json) => request('POST', path, json === undefined ? {} : { json });

const pause = (ms) => new Promise((resolve) => setTimeout(resolve, ms));
const transient = (e) => e instanceof NetworkError || (e instanceof ApiError && [502, 503, 504].includes(e.status));

/**
 * Records a verdict under the caller's id. The id makes the request safe to repeat, so it is
 * retried (up to `retries` times, three unless told, with growing pauses) when the answer is
 * lost on the way.
 */
export async function putVerdict(id, body, { retries = VERDICT_RETRIES } = {}) {
  for (let attempt = 0; ; attempt++) {
    try {
      return await request('PUT', 'api/verdicts/' + encodeURIComponent(id), { json: body });
    } catch (e) {
      if (!transient(e) || attempt >= retries) throw e;
      await pause(500 * 2 ** attempt);
    }
  }
}

/** A random UUID; `crypto.randomUUID` exists only in secure contexts, so fall back to random bytes. */
export function uuid() {
  if (crypto.randomUUID) return crypto.randomUUID();
  const b = crypto.getRandomValues(new Uint8Array(16));
  b[6] = (b[6] & 0x0f) | 0x40;
  b[8] = (b[8] & 0x3f) | 0x80;
  const hex = [...b].map((x) => x.toString(16).padStart(2, '0')).join('');
  return `${hex.slice(0, 8)}-${hex.slice(8, 12)}-${hex.slice(12, 16)}-${hex.slice(16, 20)}-${hex.slice(20)}`;
}
