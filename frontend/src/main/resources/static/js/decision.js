// The verdict being made on the current draft: the chosen verdict and reason, the shape being
// amended, and recording it. A verdict that got no answer keeps its UUID, so sending it again
// cannot count it twice.

import { ApiError, NetworkError, putVerdict, uuid } from './api.js';
import { byId } from './dom.js';
import { canAmend, startAmend } from './amend.js';
import { shownGeometry } from './layers.js';
import * as panel from './panel.js';
import { shapeProblem } from './shape-check.js';
import { STATES } from './styles.js';

const CHOOSE_FIRST = 'Choose a verdict first: a, m, r or e.';

export class Decision {
  /**
   * `context`: {review, map, layers, outbox, username, reveal(feature, force), recorded(draft, said)}.
   * A verdict that finds no server is kept in the outbox and shown as pending.
   */
  constructor(context) {
    this.c = context;
    this.choice = null; // {verdict, reasonCode}
    this.editor = null; // the vertex handles while amending
    this.pending = null; // {key, id} of a verdict sent without a confirmed answer
    this.busy = false;
    this.pickReason = this.pickReason.bind(this);
  }

  /** Forgets the choice and any unsaved shape change, and clears the comment. */
  drop() {
    const { review, layers } = this.c;
    if (this.editor) {
      this.editor.stop();
      this.editor = null;
      if (review.current) layers.setCurrentGeometry(shownGeometry(review.current));
    }
    this.choice = null;
    byId('comment').value = '';
    panel.showChoice(review, null, this.pickReason);
  }

  /** Chooses a verdict; `quick` (the keyboard) records Accept at once when it has a default reason. */
  choose(verdict, quick = false) {
    const draft = this.c.review.current;
    if (!draft || this.busy) return;
    if (this.choice?.verdict !== verdict) this.begin(draft, verdict);
    panel.showChoice(this.c.review, this.choice, this.pickReason);
    if (quick && verdict === 'ACCEPT' && this.choice.reasonCode) {
      this.record();
      return;
    }
    panel.focusReasons();
    panel.status(this.choice.reasonCode ? '' : 'Pick a reason: press its number, or click it.');
  }

  begin(draft, verdict) {
    const { review, map, layers, reveal } = this.c;
    const comment = byId('comment').value;
    this.drop();
    byId('comment').value = comment;
    this.choice = { verdict, reasonCode: review.defaultReason(verdict)?.code || null };
    const geometry = shownGeometry(draft);
    if (verdict === 'AMEND' && canAmend(geometry)) {
      reveal(draft, true); // handles need room: show the draft large
      this.editor = startAmend(map, geometry, (edited) => layers.setCurrentGeometry(edited), {
        roadEnds: () => layers.roadEnds(draft.id),
        say: (text, kind) => panel.status(text, kind),
      });
    }
  }

  /** While amending a road: join or split (see amend.js). */
  edit(action) {
    if (!this.editor) return panel.status('Amend first: press m.', 'error');
    return this.editor[action]();
  }

  pickReason(code) {
    if (!this.choice) return;
    this.choice.reasonCode = code;
    panel.showChoice(this.c.review, this.choice, this.pickReason);
    panel.status('');
  }

  pickNumber(number) {
    if (!this.choice) return panel.status(CHOOSE_FIRST, 'error');
    const reason = this.c.review.reasonByNumber(this.choice.verdict, number);
    if (!reason) return panel.status(`${STATES[this.choice.verdict].verb} has no reason ${number}.`, 'error');
    this.pickReason(reason.code);
  }

  body(draft) {
    const { verdict, reasonCode } = this.choice;
    const amended = this.editor ? this.editor.geometry() : shownGeometry(draft);
    return {
      draftId: draft.id, verdict, reasonCode,
      comment: byId('comment').value.trim() || null,
      geometry: verdict === 'AMEND' ? amended : null,
    };
  }

  async record() {
    const { review, outbox } = this.c;
    const draft = review.current;
    if (this.busy || !draft) return;
    if (!this.choice) return panel.status(CHOOSE_FIRST, 'error');
    if (!this.choice.reasonCode) return panel.status('Pick a reason first: press its number.', 'error');
    const body = this.body(draft);
    if (body.verdict === 'AMEND') {
      const problem = shapeProblem(body.geometry);
      if (problem) return panel.status(`${problem} Change the shape, or press Esc to start again.`, 'error');
    }
    const key = JSON.stringify(body);
    if (!this.pending || this.pending.key !== key) this.pending = { key, id: uuid() };
    const { id } = this.pending;
    if (outbox.count > 0) return this.keep(draft, body, id); // keep the order they were given in
    this.busy = true;
    byId('record').disabled = true;
    panel.status('Recording…');
    try {
      const answer = await putVerdict(id, body, { retries: 1 });
      this.pending = null;
      this.done(draft, body, answer, `Recorded: ${STATES[body.verdict].verb}, ${this.c.review.reasonLabel(body.verdict, body.reasonCode)}.`);
    } catch (e) {
      if (e instanceof NetworkError || (e instanceof ApiError && [502, 503, 504].includes(e.status))) {
        this.busy = false;
        this.keep(draft, body, id, true);
        return undefined;
      }
      panel.status(e.message, 'error');
      byId('record').disabled = false;
    } finally {
      this.busy = false;
    }
    return undefined;
  }

  /** The server cannot be reached: keep the verdict on this device, show it, and move on. */
  keep(draft, body, id, tried = false) {
    const { review, outbox, username } = this.c;
    // tried: the request may have reached the server although no answer came back
    outbox.add({ id, cellId: review.cell.id, body, before: draft.properties.verdict || null, tried });
    review.kept(draft, body, id, username);
    this.pending = null;
    this.done(draft, body, null, `Kept on this device: ${STATES[body.verdict].verb}. It is sent when the server answers.`);
    outbox.flush();
  }

  done(draft, body, answer, said) {
    const { review, layers, username, recorded } = this.c;
    if (answer) review.recorded(draft, body, answer, username);
    if (this.editor) this.editor.stop();
    this.editor = null;
    layers.update(draft);
    recorded(draft, said);
  }
}
