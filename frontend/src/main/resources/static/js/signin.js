// The sign-in form: fetch once so the CSRF cookie exists, then post the form.

import { ApiError, request } from './api.js';
import { byId, say } from './dom.js';

// Only a page of ours may be the destination, never another site.
function destination() {
  const next = new URLSearchParams(location.search).get('next');
  return next && /^[a-z][a-z0-9-]*\.html(\?[\w=&%.-]*)?$/.test(next) ? next : 'index.html';
}

async function alreadySignedIn() {
  try {
    await request('GET', 'api/me', { allow401: true });
    return true;
  } catch {
    return false; // 401 here is the normal case, and it leaves the CSRF cookie behind
  }
}

async function submit(event) {
  event.preventDefault();
  const form = event.target;
  const status = byId('signin-status');
  const button = form.querySelector('button[type=submit]');
  button.disabled = true;
  say(status, 'Signing in…');
  try {
    await request('POST', 'api/session', {
      form: { username: form.username.value.trim(), password: form.password.value },
      allow401: true,
    });
    location.assign(destination());
  } catch (e) {
    const wrong = e instanceof ApiError && e.status === 401;
    say(status, wrong ? 'That name and password do not match an account.' : e.message, 'error');
    form.password.select();
    button.disabled = false;
  }
}

async function start() {
  if (await alreadySignedIn()) {
    location.replace(destination());
    return;
  }
  const form = byId('signin-form');
  form.addEventListener('submit', submit);
  form.querySelector('button[type=submit]').disabled = false;
  byId('username').focus();
}

start();
