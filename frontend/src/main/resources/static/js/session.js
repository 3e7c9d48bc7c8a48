// Who is signed in, shown in the page header, and signing out.

import { get, request } from './api.js';
import { byId } from './dom.js';

const ROLE_NAMES = { VALIDATOR: 'Validator', LEAD: 'Lead', ADMIN: 'Administrator' };

export const isLead = (me) => me.role === 'LEAD' || me.role === 'ADMIN';

/** Loads the current account and fills the header's user area (#who, #sign-out). */
export async function showSignedIn() {
  const me = await get('api/me');
  byId('who').textContent = `${me.displayName || me.username} · ${ROLE_NAMES[me.role] || me.role}`;
  const button = byId('sign-out');
  button.hidden = false;
  button.addEventListener('click', signOut);
  return me;
}

async function signOut() {
  try {
    await request('POST', 'api/session/end');
  } finally {
    location.assign('signin.html');
  }
}
