import { HttpErrorResponse } from '@angular/common/http';
import { problemMessage } from './problem-message';

const refused = new HttpErrorResponse({
  status: 400,
  error: {
    type: '/problems/validation',
    title: 'Invalid request',
    status: 400,
    detail: 'Choose a password that is harder to guess.',
    errors: [{ field: 'password', message: 'This password is one of the most commonly used ones.' }],
  },
});

describe('problemMessage', () => {
  it('lists field errors after the detail for a screen with nowhere else to show them', () => {
    expect(problemMessage(refused)).toBe(
      'Choose a password that is harder to guess. (password: This password is one of the most commonly used ones.)',
    );
  });

  it('leaves them out for a form that shows each under its own field', () => {
    expect(problemMessage(refused, { fields: false })).toBe('Choose a password that is harder to guess.');
  });

  it('speaks of the connection when the server cannot be reached', () => {
    expect(problemMessage(new HttpErrorResponse({ status: 0 }), { fields: false })).toMatch(
      /cannot reach the server/,
    );
  });
});
