import { HttpErrorResponse } from '@angular/common/http';
import defaultRules from '../../../../../rules/default-rule-set.json';
import { ruleChangeWords, rulePathWords } from '../../../../../shared/types/rule-words';
import { activityIndexOf, cellOf, placeOf, problemsByCell, refusalProblems } from './rule-cells';

describe('rulePathWords', () => {
  it('says a parameter’s place in the words of the tables, not as a pointer', () => {
    expect(rulePathWords('/parameters/groupSizes/keep-ball/beginner/max')).toBe(
      'Group sizes › Keep-ball › Beginner › Most',
    );
    expect(rulePathWords('/parameters/areas/small-sided-game/U15-adult/minWidth')).toBe(
      'Area sizes › Small-sided game › Under 15 to adult › Narrowest',
    );
    expect(rulePathWords('/parameters/keepBall/advanced/formats/1')).toBe(
      'Keep-ball ratios › Advanced › Formats › Format 2',
    );
    expect(rulePathWords('/parameters/ageGroups/U9/allowedKinds')).toBe(
      'Activities by age › Under 9 › Activities allowed',
    );
    expect(rulePathWords('/parameters/cautions/coldC')).toBe('Safety › Cold weather below');
  });

  it('names rows by their own names when it has the rule set: parts of a session, activities (by place or id)', () => {
    const rules = defaultRules as unknown as {
      parameters: {
        sessionShapes: Record<string, Record<string, { name: string }[]>>;
        activities: { id: string; title: string }[];
      };
    };
    const part = rules.parameters.sessionShapes['training']['U9-U10'][1];
    expect(rulePathWords('/parameters/sessionShapes/training/U9-U10/1/share', rules)).toBe(
      `Parts of a session › Training session › Under 9 to 10 › ${part.name} › Share`,
    );
    const activity = rules.parameters.activities[3];
    expect(rulePathWords('/parameters/activities/3/players/max', rules)).toBe(
      `Our activities › ${activity.title} › Players in a group › Most`,
    );
    expect(rulePathWords(`/parameters/activities/${activity.id}/title`, rules)).toBe(
      `Our activities › ${activity.title} › Title`,
    );
    // Without the document a row is counted, never shown as an index or code.
    expect(rulePathWords('/parameters/activities/3/title')).toBe('Our activities › Activity 4 › Title');
  });

  it('writes a change as place: before → after, in words', () => {
    expect(
      ruleChangeWords({
        path: '/parameters/groupSizes/keep-ball/beginner/max',
        change: 'changed',
        before: 6,
        after: 5,
      }),
    ).toBe('Group sizes › Keep-ball › Beginner › Most: 6 → 5');
    expect(
      ruleChangeWords({
        path: '/parameters/keepBall/beginner/formats',
        change: 'changed',
        before: [{ attackers: 4, defenders: 1 }],
        after: [
          { attackers: 4, defenders: 1 },
          { attackers: 3, defenders: 1 },
        ],
      }),
    ).toBe('Keep-ball ratios › Beginner › Formats: 4v1 → 4v1, 3v1');
    expect(
      ruleChangeWords({
        path: '/parameters/ageGroups/U8/allowedKinds',
        change: 'changed',
        before: ['keep-ball'],
        after: [],
      }),
    ).toBe('Activities by age › Under 8 › Activities allowed: Keep-ball → none');
    expect(
      ruleChangeWords({
        path: '/parameters/keepBall/beginner/formats/1',
        change: 'removed',
        before: { attackers: 3, defenders: 1 },
      }),
    ).toBe('Keep-ball ratios › Beginner › Formats › Format 2: removed (was 3v1)');
  });
});

describe('rule cells', () => {
  it('finds the table cell that shows a problem, or none when only the text view has it', () => {
    expect(cellOf('/parameters/groupSizes/keep-ball/beginner/max')).toBe(
      '/parameters/groupSizes/keep-ball/beginner/max',
    );
    expect(cellOf('/parameters/keepBall/beginner/formats/0')).toBe('/parameters/keepBall/beginner/formats');
    expect(cellOf('/parameters/supervision/ratios/2/childrenPerAdult')).toBe(
      '/parameters/supervision/ratios/2/childrenPerAdult',
    );
    expect(cellOf('/parameters/layout/bufferM')).toBeNull();
    expect(cellOf('/rules/4/event/params/path')).toBeNull();
  });

  it('says where a cell sits: its fold and the level, age band or kind of session picked above it', () => {
    expect(placeOf('/parameters/groupSizes/duel/advanced/min')).toEqual({
      panel: 'groupSizes',
      level: 'advanced',
    });
    expect(placeOf('/parameters/areas/duel/U11-U12/step')).toEqual({ panel: 'areas', band: 'U11-U12' });
    expect(placeOf('/parameters/sessionShapes/training/U6-U8/0/share')).toEqual({
      panel: 'sessionShapes',
      planKind: 'training',
      band: 'U6-U8',
    });
    expect(activityIndexOf('/parameters/activities/12/players/max')).toBe(12);
    expect(activityIndexOf('/parameters/activityCount')).toBeNull();
  });

  it('gathers each cell’s problems, and reads a refusal’s field errors as problems at their places', () => {
    const cells = problemsByCell([
      { pointer: '/parameters/keepBall/beginner/formats/0', message: 'first' },
      { pointer: '/parameters/keepBall/beginner/formats/1', message: 'second' },
      { pointer: '/parameters/layout/bufferM', message: 'text view only' },
    ]);
    expect([...cells]).toEqual([['/parameters/keepBall/beginner/formats', ['first', 'second']]]);

    const refusal = new HttpErrorResponse({
      status: 400,
      error: {
        type: '/problems/validation',
        title: 'Invalid request',
        status: 400,
        errors: [
          {
            field: 'body/parameters/cautions/coldC',
            message: 'Safety › Cold weather below: must be a number.',
          },
          { field: 'name', message: 'is too long' },
        ],
      },
    });
    expect(refusalProblems(refusal)).toEqual([
      { pointer: '/parameters/cautions/coldC', message: 'Safety › Cold weather below: must be a number.' },
    ]);
    expect(refusalProblems(new HttpErrorResponse({ status: 409, error: {} }))).toEqual([]);
  });
});
