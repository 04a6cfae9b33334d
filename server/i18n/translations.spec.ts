import { describe, expect, it } from 'vitest';
import defaultRules from '../../rules/default-rule-set.json';
import { ruleSetWords } from '../../shared/i18n/rule-set-words';
import { changeInReaderWords, inReaderWords, inSourceWords, RULE_WORDS } from './rule-set-words';
import { currentLanguage, inLanguage, installTranslations, readXliff } from './translations';

describe('the server in the reader’s language', () => {
  installTranslations();

  it('reads an XLIFF target with its placeholders as $localize writes them', () => {
    const xml = `<?xml version="1.0" encoding="UTF-8" ?>
<xliff version="1.2" xmlns="urn:oasis:names:tc:xliff:document:1.2"><file source-language="en-GB" target-language="es" datatype="plaintext" original="ng2.template"><body>
  <trans-unit id="42" datatype="html"><source>Only <x id="balls" equiv-text="n"/> balls &amp; bibs</source><target state="translated">Solo <x id="balls" equiv-text="n"/> balones y petos &lt;3</target></trans-unit>
  <trans-unit id="43" datatype="html"><source>Not yet</source></trans-unit>
</body></file></xliff>`;
    expect(readXliff(xml)).toEqual({ '42': 'Solo {$balls} balones y petos <3' });
  });

  it('translates $localize words into the language of the work being done, and only there', () => {
    const count = 3;
    expect($localize`Coach`).toBe('Coach');
    expect(inLanguage('es', () => $localize`Coach`)).toBe('Entrenador');
    expect(inLanguage('es', () => currentLanguage())).toBe('es');
    // After an await the work keeps its language (AsyncLocalStorage follows the promise).
    return inLanguage('es', async () => {
      await new Promise((resolve) => setTimeout(resolve, 1));
      expect($localize`Head of coaching`).toBe('Coordinador técnico');
      expect(`${count} ${$localize`Coach`}`).toBe('3 Entrenador');
    }).then(() => expect($localize`Coach`).toBe('Coach'));
  });

  it('keeps a message it has no translation for in the source language', () => {
    expect(inLanguage('es', () => $localize`A sentence nobody has translated yet`)).toBe(
      'A sentence nobody has translated yet',
    );
  });
});

describe('the starting rules’ words', () => {
  const words = ruleSetWords(defaultRules);
  const spanish = RULE_WORDS.es!;

  it('has a Spanish sentence for every word of the starting rules, and none for words they no longer hold', () => {
    expect(words.length).toBeGreaterThan(700);
    expect(words.filter((w) => !spanish[w]?.trim())).toEqual([]);
    expect(Object.keys(spanish).filter((w) => !words.includes(w))).toEqual([]);
  });

  it('gives two different sentences two different translations, so an edited draft reads back as it was', () => {
    const bySpanish = new Map<string, string[]>();
    for (const [english, translated] of Object.entries(spanish))
      bySpanish.set(translated, [...(bySpanish.get(translated) ?? []), english]);
    expect([...bySpanish.entries()].filter(([, english]) => english.length > 1)).toEqual([]);
  });

  it('reads the rules in Spanish and stores them back in the source language, leaving a club’s own words as written', () => {
    const clubs = structuredClone(defaultRules) as typeof defaultRules;
    clubs.parameters.activities[0]!.coachingPoints[0] = 'Our own point: heads up!';
    const read = inReaderWords(clubs, 'es');
    const first = read.parameters.activities[0]!;
    expect(first.title).toBe(spanish[defaultRules.parameters.activities[0]!.title]);
    expect(first.coachingPoints[0]).toBe('Our own point: heads up!');
    expect(first.id).toBe(defaultRules.parameters.activities[0]!.id);
    expect(read.rules.map((r) => r.id)).toEqual(defaultRules.rules.map((r) => r.id));
    expect(inSourceWords(read)).toEqual(clubs);
    expect(inReaderWords(clubs, 'es')).toBe(read);
    expect(inReaderWords(clubs, 'en')).toBe(clubs);
  });

  it('reads a history line of the rules in the reader’s words, whatever part of the rules it touched', () => {
    const first = defaultRules.parameters.activities[0]!;
    const lines = [
      {
        path: '/parameters/activities/0/coachingPoints/1',
        change: 'changed',
        before: first.coachingPoints[1],
        after: 'Ours',
      },
      { path: '/parameters/activities/0/title', change: 'changed', before: first.title, after: first.title },
      { path: '/parameters/activities/0', change: 'removed', before: first },
      { path: '/parameters/groupSizes/keep-ball/beginner/max', change: 'changed', before: 6, after: 5 },
    ];
    const read = inLanguage('es', () => lines.map(changeInReaderWords));
    expect(read[0]).toEqual({ ...lines[0], before: spanish[first.coachingPoints[1]!], after: 'Ours' });
    expect(read[1]!.after).toBe(spanish[first.title]);
    expect((read[2]!.before as typeof first).coachingPoints).toEqual(
      first.coachingPoints.map((p) => spanish[p]),
    );
    expect(read[3]).toEqual(lines[3]);
    expect(lines.map(changeInReaderWords)).toEqual(lines);
  });
});
