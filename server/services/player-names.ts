import '../../shared/i18n/localize';
import { cleanName, type TakenNames } from '../../shared/types/player-name';
import { conflict } from '../http/problem';

export { cleanName, nameKey, pickName, shortName, TakenNames } from '../../shared/types/player-name';

/** Answers 409 in a coach's words when a team already has a player of that name. */
export function assertNameFree(name: string, taken: TakenNames): void {
  if (!taken.has(name)) return;
  const player = cleanName(name);
  throw conflict(
    $localize`There is already a player called ${player}:name: on this team. Add another letter of the family name, or use a name the team knows them by.`,
  );
}
