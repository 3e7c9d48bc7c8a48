// Small DOM helpers. Text goes in as text, never as HTML; styles come from classes.

/** Creates an element: el('li', {className: 'x', dataset: {id: 1}}, 'text', child, ...). */
export function el(tag, props = {}, ...children) {
  const node = document.createElement(tag);
  for (const [key, value] of Object.entries(props)) {
    if (value === undefined || value === null || value === false) continue;
    if (key === 'dataset') Object.assign(node.dataset, value);
    else if (key.startsWith('aria-') || key === 'role' || key === 'for') node.setAttribute(key, value);
    else node[key] = value;
  }
  node.append(...children.filter((c) => c !== null && c !== undefined && c !== false));
  return node;
}

export const byId = (id) => document.getElementById(id);

/** Shows a message in a status line; `kind` is 'info', 'ok' or 'error'. */
export function say(node, text, kind = 'info') {
  node.textContent = text;
  node.dataset.kind = kind;
  node.hidden = !text;
}

export function percent(part, whole) {
  return whole > 0 ? Math.round((100 * part) / whole) : 0;
}

/** Sets a bar's fill; the bar is decoration, the numbers beside it are the accessible text. */
export function fillBar(bar, part, whole) {
  bar.firstElementChild.style.width = percent(part, whole) + '%';
}

/** A cell's number as people count: the server's `seq` starts at 0. */
export const cellNumber = (cell) => cell.seq + 1;

export function timeOfDay(iso) {
  if (!iso) return '';
  return new Date(iso).toLocaleTimeString([], { hour: '2-digit', minute: '2-digit' });
}
