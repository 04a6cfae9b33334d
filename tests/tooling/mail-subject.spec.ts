/** Subjects fit the outbox column: long club and person names never make a send fail. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { fitSubject, SUBJECT_MAX_LENGTH } from '../../server/services/mail-queue';

describe('fitSubject', () => {
  it('leaves a subject that fits as it is', () => {
    expect(fitSubject('Robin invited you to Hazelbrook Colts on Conewise')).toBe(
      'Robin invited you to Hazelbrook Colts on Conewise',
    );
  });

  it('cuts a long one at a whole character and ends it with an ellipsis', () => {
    const name = `${'Ä'.repeat(100)}🦊${'ß'.repeat(110)}`;
    const fitted = fitSubject(`${name} invited you`);
    expect(fitted.length).toBeLessThanOrEqual(SUBJECT_MAX_LENGTH);
    expect(fitted.endsWith('…')).toBe(true);
    expect(fitted).toContain('🦊');
    expect(fitSubject(`${'x'.repeat(198)}👩‍👩‍👧 on Conewise`)).toBe(`${'x'.repeat(198)}…`);
  });

  it('keeps any subject within the column and on one line (property)', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'grapheme', maxLength: 400 }), (subject) => {
        const fitted = fitSubject(subject);
        expect(fitted.length).toBeLessThanOrEqual(SUBJECT_MAX_LENGTH);
        expect(fitted).not.toMatch(/[\r\n]/);
        if (subject.length <= SUBJECT_MAX_LENGTH && !/[\r\n]/.test(subject)) expect(fitted).toBe(subject);
      }),
    );
  });
});
