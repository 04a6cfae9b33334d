import { setAt } from '../../../../../shared/json-pointer';
import { editedChanges, type JsonChange } from '../../../core/engine/engine-adapter';

/** The outcome of putting one lead's edits on top of another lead's newer save. */
export interface Rebased {
  body: unknown;
  /** Every edit of mine that was re-applied. */
  reapplied: JsonChange[];
  /** Places both of us changed: mine won, theirs is shown so the lead can choose. */
  overlaps: { pointer: string; theirs: unknown; mine: unknown }[];
}

const related = (a: string, b: string) => a === b || a.startsWith(`${b}/`) || b.startsWith(`${a}/`);

/** Re-applies the changes from base to mine onto theirs, so a 409 never loses an edit. */
export function rebaseEdits(base: unknown, mine: unknown, theirs: unknown): Rebased {
  const myChanges = editedChanges(base, mine);
  const theirChanges = editedChanges(base, theirs);
  let body = theirs;
  const overlaps: Rebased['overlaps'] = [];
  for (const change of myChanges) {
    body = setAt(body, change.path, change.change === 'removed' ? undefined : change.after);
    const clash = theirChanges.find((other) => related(other.path, change.path));
    if (clash) overlaps.push({ pointer: change.path, theirs: clash.after, mine: change.after });
  }
  return { body, reapplied: myChanges, overlaps };
}
