// The state of reviewing one cell: its drafts in order, which one is current, the reasons per
// verdict with their number keys, and the cell's progress. No DOM and no map here.

// The server's shortcut is used when it is one digit, unique within the verdict; else the position.
function numbered(reasons) {
  const digits = reasons.map((r) => String(r.shortcut ?? ''));
  const usable = digits.every((d) => /^[1-9]$/.test(d)) && new Set(digits).size === digits.length;
  const number = (i) => (usable ? Number(digits[i]) : i < 9 ? i + 1 : null);
  return reasons.map((r, i) => ({ ...r, number: number(i) }))
    .sort((a, b) => (a.number ?? 99) - (b.number ?? 99));
}

export class Review {
  constructor(cell, collection, reasons) {
    this.cell = cell;
    this.drafts = [...collection.features].sort((a, b) => (a.properties.seq ?? 0) - (b.properties.seq ?? 0) || a.id - b.id);
    this.reasons = new Map();
    for (const verdict of new Set(reasons.map((r) => r.verdict))) {
      this.reasons.set(verdict, numbered(reasons.filter((r) => r.verdict === verdict)));
    }
    const firstOpen = this.drafts.findIndex((d) => !d.properties.verdict);
    this.index = Math.max(firstOpen, 0);
  }

  get current() {
    return this.drafts[this.index] || null;
  }

  get count() {
    return this.drafts.length;
  }

  /** Drafts with a verdict here, counting those kept on this device until they are sent. */
  get decided() {
    return this.drafts.filter((d) => d.properties.verdict).length;
  }

  /** Verdicts waiting on this device for the server. */
  get pending() {
    return this.drafts.filter((d) => d.properties.verdict?.pending).length;
  }

  byId(id) {
    return this.drafts.find((d) => d.id === id) || null;
  }

  /** The draft with the latest verdict of `username` that the server has (what an undo takes back). */
  latestOf(username) {
    let latest = null;
    for (const draft of this.drafts) {
      const v = draft.properties.verdict;
      if (!v || v.pending || v.validator !== username || !v.id) continue;
      if (!latest || String(v.createdAt) > String(latest.properties.verdict.createdAt)) latest = draft;
    }
    return latest;
  }

  /** Shows a verdict kept on this device (not yet sent) on the draft. */
  kept(draft, body, id, username) {
    draft.properties.verdict = {
      id, verdict: body.verdict, reasonCode: body.reasonCode, comment: body.comment, validator: username,
      geometry: body.geometry || null, createdAt: new Date().toISOString(), pending: true,
    };
  }

  /** Puts a draft back to a verdict (or none) after an undo; `cell` is the server's progress, if it answered. */
  restore(draft, verdict, cell = null) {
    draft.properties.verdict = verdict || null;
    if (cell) Object.assign(this.cell, { decidedCount: cell.decidedCount, finished: cell.finished });
  }

  reasonsFor(verdict) {
    return this.reasons.get(verdict) || [];
  }

  defaultReason(verdict) {
    return this.reasonsFor(verdict).find((r) => r.isDefault) || null;
  }

  reasonByNumber(verdict, number) {
    return this.reasonsFor(verdict).find((r) => r.number === number) || null;
  }

  reasonLabel(verdict, code) {
    const reason = this.reasonsFor(verdict).find((r) => r.code === code);
    return reason ? reason.label : code;
  }

  /** Moves by `step` (wrapping); returns whether the current draft changed. */
  move(step) {
    if (this.count === 0) return false;
    const before = this.index;
    this.index = (this.index + step + this.count) % this.count;
    return this.index !== before;
  }

  moveTo(id) {
    const i = this.drafts.findIndex((d) => d.id === id);
    if (i < 0 || i === this.index) return false;
    this.index = i;
    return true;
  }

  /** Moves to the next draft without a verdict after the current one; false when there is none. */
  moveToNextOpen() {
    for (let k = 1; k <= this.count; k++) {
      const i = (this.index + k) % this.count;
      if (!this.drafts[i].properties.verdict) {
        this.index = i;
        return true;
      }
    }
    return false;
  }

  /** Records the server's answer to a verdict (the same shape as a draft's `verdict`) on the draft and the cell. */
  recorded(draft, body, answer, username) {
    const { cell, ...verdict } = answer;
    draft.properties.verdict = {
      verdict: body.verdict, reasonCode: body.reasonCode, comment: body.comment, validator: username,
      ...verdict, geometry: verdict.geometry || body.geometry || null,
    };
    Object.assign(this.cell, cell);
  }
}
