import defaultRules from '../../../../../rules/default-rule-set.json';
import { AGE_GROUPS, type ActivityDefinition, type RuleSetDocument } from '../../../../../shared/types';
import { libraryEntries } from './library-entries';
import { filterLibrary, NO_FILTER } from './library-filter';

const rules = () => structuredClone(defaultRules) as unknown as RuleSetDocument;
const ageIndex = (age: string) => AGE_GROUPS.indexOf(age as (typeof AGE_GROUPS)[number]);

describe('library entries and filters', () => {
  it('leaves retired activities out and lists the club’s own first', () => {
    const doc = rules();
    const first = doc.parameters.activities[0];
    first.retired = true;
    const club: ActivityDefinition = {
      ...doc.parameters.activities[1],
      id: 'club-wall-passes',
      title: 'Wall passes at the fence',
      origin: 'club',
    };
    doc.parameters.activities.push(club);
    const entries = libraryEntries(doc);
    expect(entries.map((e) => e.id)).not.toContain(first.id);
    expect(entries[0]).toMatchObject({ id: 'club-wall-passes', club: true });
    expect(entries.filter((e) => e.club)).toHaveLength(1);
    expect(entries).toHaveLength(doc.parameters.activities.length - 1);
  });

  it('keeps only activities whose ages include the age group', () => {
    const entries = libraryEntries(rules());
    const u8 = filterLibrary(entries, { ...NO_FILTER, ageGroup: 'U8' });
    expect(u8.length).toBeGreaterThan(0);
    expect(u8.length).toBeLessThan(entries.length);
    for (const e of u8) {
      expect(ageIndex(e.ages.from)).toBeLessThanOrEqual(ageIndex('U8'));
      expect(ageIndex(e.ages.to)).toBeGreaterThanOrEqual(ageIndex('U8'));
    }
    const left = entries.filter((e) => !u8.includes(e));
    expect(
      left.every((e) => ageIndex(e.ages.from) > ageIndex('U8') || ageIndex(e.ages.to) < ageIndex('U8')),
    ).toBe(true);
  });

  it('combines kind, focus and age', () => {
    const entries = libraryEntries(rules());
    const shown = filterLibrary(entries, {
      ...NO_FILTER,
      ageGroup: 'U12',
      kind: 'keep-ball',
      focus: 'pressing',
    });
    expect(shown.length).toBeGreaterThan(0);
    for (const e of shown) {
      expect(e.kind).toBe('keep-ball');
      expect(e.focus).toContain('pressing');
    }
    const expected = entries.filter(
      (e) =>
        e.kind === 'keep-ball' &&
        e.focus.includes('pressing') &&
        ageIndex(e.ages.from) <= ageIndex('U12') &&
        ageIndex(e.ages.to) >= ageIndex('U12'),
    );
    expect(shown.map((e) => e.id)).toEqual(expected.map((e) => e.id));
  });

  it('finds every word of the search in any order, ignoring case and accents', () => {
    const doc = rules();
    doc.parameters.activities.push({
      ...doc.parameters.activities[0],
      id: 'club-pase-rapido',
      title: 'Pasé rápido',
      summary: 'Quick one-touch passing around a square.',
      origin: 'club',
    });
    const entries = libraryEntries(doc);
    expect(filterLibrary(entries, { ...NO_FILTER, text: 'RAPIDO pase' }).map((e) => e.id)).toEqual([
      'club-pase-rapido',
    ]);
    const target = entries.find((e) => !e.club)!;
    const word = target.definition.coachingPoints[0].split(/\s+/).find((w) => w.length > 5)!;
    expect(filterLibrary(entries, { ...NO_FILTER, text: word.toUpperCase() }).map((e) => e.id)).toContain(
      target.id,
    );
    expect(filterLibrary(entries, { ...NO_FILTER, text: 'zzqx-not-a-word' })).toEqual([]);
    // Words are found from their start: "rapid" finds "rápido", "apido" finds nothing.
    expect(filterLibrary(entries, { ...NO_FILTER, text: 'rapid' }).map((e) => e.id)).toContain(
      'club-pase-rapido',
    );
    expect(filterLibrary(entries, { ...NO_FILTER, text: 'apido' }).map((e) => e.id)).not.toContain(
      'club-pase-rapido',
    );
  });
});
