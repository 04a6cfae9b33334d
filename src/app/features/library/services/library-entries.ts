import type {
  ActivityDefinition,
  AgeGroup,
  Focus,
  Level,
  RuleSetDocument,
  StationKind,
} from '../../../../../shared/types';
import { isFirstFormat, listActivities, upgradeRuleSet } from '../../../core/engine/engine-adapter';

/** One activity as the library shows it: the engine's listing joined with its full definition. */
export interface LibraryEntry {
  id: string;
  kind: StationKind;
  title: string;
  summary: string;
  ages: { from: AgeGroup; to: AgeGroup };
  levels: Level[];
  focus: Focus[];
  /** Added by the club itself ("Our club"). */
  club: boolean;
  definition: ActivityDefinition;
}

/** A stored rule set in the current format: one of the first format is brought up to date by the engine. */
export function currentRuleSet(body: unknown): RuleSetDocument {
  const doc = body as RuleSetDocument;
  return isFirstFormat(doc) ? upgradeRuleSet(doc) : doc;
}

/**
 * The activities the club's rules offer (the engine leaves retired ones out), the club's own
 * first, then in the rule set's order.
 */
export function libraryEntries(ruleSet: RuleSetDocument): LibraryEntry[] {
  const definitions = new Map(ruleSet.parameters.activities.map((a) => [a.id, a]));
  const entries: LibraryEntry[] = [];
  for (const option of listActivities(ruleSet)) {
    const definition = definitions.get(option.id);
    if (!definition) continue;
    entries.push({
      id: option.id,
      kind: option.kind,
      title: option.title,
      summary: option.summary,
      ages: option.ages,
      levels: option.levels,
      focus: definition.focus,
      club: definition.origin === 'club',
      definition,
    });
  }
  return [...entries.filter((e) => e.club), ...entries.filter((e) => !e.club)];
}
