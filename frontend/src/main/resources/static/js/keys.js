// The review loop's keyboard: one table of keys, used both to dispatch and to write the help.
// Keys are ignored while typing, except Escape (leave the field) and Ctrl+Enter (record).

import { el } from './dom.js';
import { STATES } from './styles.js';

const verdictKey = (verdict, help) => ({ keys: [STATES[verdict].key], action: 'verdict', arg: verdict, help });

export const BINDINGS = [
  verdictKey('ACCEPT', 'Accept with the default reason, recorded at once (Shift+a: choose Accept, then pick another reason)'),
  verdictKey('AMEND', 'Amend: drag the square handles (or focus one and use the arrow keys), then pick a reason'),
  verdictKey('REJECT', 'Reject, then pick a reason'),
  verdictKey('ESCALATE', 'Escalate to a lead, then pick a reason'),
  { keys: ['1', '9'], range: true, action: 'reason', help: 'Pick the reason with that number' },
  { keys: ['Enter'], action: 'record', help: 'Record the chosen verdict (Ctrl+Enter from the comment box)' },
  { keys: ['Escape'], action: 'cancel', help: 'Drop the chosen verdict and undo unsaved shape changes' },
  { keys: ['Backspace', 'Ctrl+z'], action: 'undo', help: 'Take back your last verdict in this cell; again for the one before' },
  { keys: ['j'], action: 'join', help: 'While amending a road: join its end nearest another road\'s end onto that end' },
  { keys: ['s'], action: 'split', help: 'While amending a road: split it in two at the focused vertex' },
  { keys: ['Delete'], action: 'removeVertex', help: 'While amending: remove the focused vertex (or right-click a vertex)' },
  { keys: ['n'], action: 'next', help: 'Next draft' },
  { keys: ['p'], action: 'previous', help: 'Previous draft' },
  { keys: ['u'], action: 'nextOpen', help: 'Next undecided draft' },
  { keys: ['z'], action: 'zoom', help: 'Zoom to the current draft' },
  { keys: ['c'], action: 'comment', help: 'Write a comment' },
  { keys: ['h'], action: 'toggleDrafts', help: 'Hide or show the other drafts' },
  { keys: ['l'], action: 'toggleReference', help: 'Hide or show the reference layer' },
  { keys: ['[', ']'], action: 'imagery', help: 'Fade the imagery, or bring it back, in steps of 10 %' },
  { keys: ['b'], action: 'plainBackground', help: 'Compare with a plain background instead of the imagery, and back' },
  { keys: ['?'], action: 'help', help: 'Show this list' },
];

const lookup = new Map();
for (const b of BINDINGS) {
  if (b.range) for (let d = 1; d <= 9; d++) lookup.set(String(d), { ...b, arg: d });
  else if (b.action === 'imagery') b.keys.forEach((k, i) => lookup.set(k, { ...b, arg: i === 0 ? -1 : 1 }));
  else b.keys.forEach((k) => lookup.set(k, b));
}

function isTyping(target) {
  if (target.isContentEditable || target.tagName === 'TEXTAREA' || target.tagName === 'SELECT') return true;
  return target.tagName === 'INPUT' && !['radio', 'checkbox', 'button', 'submit'].includes(target.type);
}

/** Calls `handlers[action](arg, shiftKey)` for the bound keys; a missing handler ignores the key. */
export function bindKeys(handlers) {
  document.addEventListener('keydown', (e) => {
    if (e.defaultPrevented || e.isComposing || e.altKey) return;
    if (document.querySelector('dialog[open]')) return; // the dialog has its own keys
    const target = e.target;
    if (isTyping(target)) {
      if (e.key === 'Escape') target.blur();
      else if (e.key === 'Enter' && (e.ctrlKey || e.metaKey)) handlers.record?.();
      else return;
      e.preventDefault();
      return;
    }
    if (e.ctrlKey || e.metaKey) {
      const chord = lookup.get('Ctrl+' + e.key.toLowerCase());
      if (chord && handlers[chord.action]) {
        e.preventDefault();
        handlers[chord.action](chord.arg, e.shiftKey);
      }
      return;
    }
    if (e.key === 'Enter' && target.closest('button, a[href], summary')) return; // activate what has focus
    const key = e.key.length === 1 ? e.key.toLowerCase() : e.key;
    const binding = lookup.get(key);
    if (!binding || !handlers[binding.action]) return;
    e.preventDefault();
    handlers[binding.action](binding.arg, e.shiftKey);
  });
}

function keyCaps(binding) {
  const name = (k) => (k === 'Escape' ? 'Esc' : k.startsWith('Ctrl+') ? 'Ctrl+' + k.slice(5).toUpperCase() : k);
  const cap = (k) => el('kbd', {}, name(k));
  if (binding.range) return [cap('1'), ' to ', cap('9')];
  return binding.keys.flatMap((k, i) => (i === 0 ? [cap(k)] : [' ', cap(k)]));
}

/** Writes the key list into a <dl>. */
export function writeHelp(list) {
  list.replaceChildren(...BINDINGS.flatMap((b) => [el('dt', {}, ...keyCaps(b)), el('dd', {}, b.help)]));
}

/** The key shown on a verdict button. */
export const keyOf = (verdict) => STATES[verdict].key;
