/**
 * The sign-in page arrives drawn in advance (server/build/prerender.ts) and the app draws it again
 * when it starts, in place of the copy. Someone quick may have typed into the copy by then: what
 * they typed, and where the cursor was, move into the app's own fields instead of being lost.
 */

/** The text fields of the copy that hold something, by name, and the one that had the cursor. */
export interface TypedBeforeStart {
  values: ReadonlyMap<string, string>;
  focused: string | null;
}

/** What was typed into the page drawn in advance; null when the page was not drawn in advance. */
export function typedBeforeStart(doc: Document): TypedBeforeStart | null {
  const root = doc.querySelector('cw-root[data-prerendered]');
  if (!root) return null;
  root.removeAttribute('data-prerendered');
  const values = new Map<string, string>();
  for (const input of Array.from(root.querySelectorAll<HTMLInputElement>('input[name]')))
    if (input.value) values.set(input.name, input.value);
  const active = doc.activeElement;
  const focused = active instanceof HTMLInputElement && root.contains(active) ? active.name : null;
  return { values, focused };
}

/**
 * Puts what was typed into the app's fields of the same name that are still empty (an `input`
 * event tells the page, as typing would) and the cursor back where it was.
 */
export function carryOverTyping(doc: Document, typed: TypedBeforeStart): void {
  const fields = Array.from(doc.querySelectorAll<HTMLInputElement>('cw-root input[name]'));
  const field = (name: string) => fields.find((input) => input.name === name);
  for (const [name, value] of typed.values) {
    const input = field(name);
    if (!input || input.value) continue;
    input.value = value;
    input.dispatchEvent(new Event('input', { bubbles: true }));
  }
  if (typed.focused) field(typed.focused)?.focus();
}
