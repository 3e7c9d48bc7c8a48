// Verdicts given while the server cannot be reached wait here, in localStorage, and are sent in
// the order given when it answers again. Each keeps the id it was made with: the server stores a
// verdict once per id and answers a repeat with what it stored, so a verdict sent twice (its
// answer lost on the way) is still counted once.

import { ApiError, NetworkError, post, putVerdict } from './api.js';

const KEY = 'assay.outbox.v1.'; // and the username: one outbox per person on a shared browser
const RETRY_MS = 4000;


// the withdrawal of a verdict kept here: null when the server never stored the verdict
async function withdraw(id) {
  try {
    return await post(`api/verdicts/${encodeURIComponent(id)}/withdrawal`);
  } catch (e) {
    if (e instanceof ApiError && e.status === 404) return null;
    throw e;
  }
}

const transient = (e) => e instanceof NetworkError || (e instanceof ApiError && [502, 503, 504].includes(e.status));

export class Outbox {
  /**
   * The outbox of `username`. `handlers`: {sent(entry, answer), refused(entry, error), changed(count)}.
   * An entry is {id, cellId, body, before, tried}: the verdict's id, its cell, the request body,
   * the draft's verdict before it (shown again if the verdict is taken back before it was sent),
   * and whether it was sent at least once; or {id, cellId, withdraw: true}, an undo to send.
   */
  constructor(username, handlers) {
    this.key = KEY + username;
    this.handlers = handlers;
    this.sending = null;
    this.timer = null;
    window.addEventListener('online', () => this.flush());
    window.addEventListener('storage', (e) => e.key === this.key && this.handlers.changed(this.count));
  }

  load() {
    try {
      const entries = JSON.parse(localStorage.getItem(this.key) || '[]');
      return Array.isArray(entries) ? entries : [];
    } catch {
      return [];
    }
  }

  get entries() {
    return this.load();
  }

  get count() {
    return this.load().length;
  }

  inCell(cellId) {
    return this.load().filter((e) => e.cellId === cellId);
  }

  save(entries) {
    localStorage.setItem(this.key, JSON.stringify(entries));
    this.handlers.changed(entries.length);
    this.schedule();
  }

  add(entry) {
    this.save([...this.load().filter((e) => e.id !== entry.id), entry]);
  }

  /**
   * Takes a waiting verdict back; returns it, or null when it was not waiting here. One that
   * was sent at least once may have reached the server with its answer lost: its withdrawal
   * then waits in its place (the server answers 404 for a verdict it never stored).
   */
  take(id) {
    const entries = this.load();
    const found = entries.find((e) => e.id === id && !e.withdraw) || null;
    if (!found) return null;
    const rest = entries.filter((e) => e.id !== id);
    this.save(found.tried ? [...rest, { id, cellId: found.cellId, withdraw: true }] : rest);
    return found;
  }

  /** Waiting verdicts of a cell (not withdrawals), oldest first. */
  verdictsIn(cellId) {
    return this.inCell(cellId).filter((e) => !e.withdraw);
  }

  schedule() {
    clearTimeout(this.timer);
    if (this.load().length > 0) this.timer = setTimeout(() => this.flush(), RETRY_MS);
  }

  /** Sends the waiting verdicts in order; stops at the first that finds no server. */
  flush() {
    if (!this.sending) {
      this.sending = this.send().finally(() => {
        this.sending = null;
        this.schedule();
      });
    }
    return this.sending;
  }

  async send() {
    for (let entry = this.load()[0]; entry; entry = this.load()[0]) {
      this.mark(entry.id);
      try {
        const answer = entry.withdraw ? await withdraw(entry.id) : await putVerdict(entry.id, entry.body, { retries: 0 });
        this.drop(entry.id);
        if (answer) this.handlers.sent(entry, answer);
      } catch (e) {
        if (transient(e)) return;
        this.drop(entry.id);
        this.handlers.refused(entry, e);
      }
    }
  }

  // a verdict that was sent once may be stored even if no answer came back
  mark(id) {
    const entries = this.load();
    const entry = entries.find((e) => e.id === id);
    if (entry && !entry.tried) {
      entry.tried = true;
      localStorage.setItem(this.key, JSON.stringify(entries));
    }
  }

  drop(id) {
    const entries = this.load().filter((e) => e.id !== id);
    localStorage.setItem(this.key, JSON.stringify(entries));
    this.handlers.changed(entries.length);
  }
}
