/**
 * Every word a person reads in the app's templates can be translated: the Spanish build would
 * otherwise show English in the middle of a Spanish screen. The checker is tested on small
 * templates first, so a pass on the app means something.
 */
import { describe, expect, it } from 'vitest';
import { unmarkedIn, unmarkedInApp } from './i18n-marks';

const ROOT = new URL('../../', import.meta.url).pathname;

describe('the i18n mark check', () => {
  it('finds text, readable attributes and words in bindings that are not marked', () => {
    const found = unmarkedIn(
      `<h2>Teams</h2>
       <input placeholder="Search players" />
       <p i18n>{{ n }} bib{{ n === 1 ? '' : 's' }}</p>
       <button [attr.aria-label]="'Area of ' + title">x</button>
       @if (ok) { <span>Saved</span> }
       @switch (kind) { @case ('a') { <b>Training</b> } }`,
      'sample.html',
    );
    expect(found.map((f) => f.text)).toEqual([
      'Teams',
      'Search players',
      's',
      'Area of',
      'Saved',
      'Training',
    ]);
    expect(found.map((f) => f.line)).toEqual([1, 2, 3, 4, 5, 6]);
  });

  it('finds an aria attribute bound as a property, which writes no attribute', () => {
    const found = unmarkedIn(
      `<button i18n-aria-label aria-label="Remove guest {{ n }}">x</button>
       <button [attr.aria-label]="label(n)">x</button>`,
      'sample.html',
    );
    expect(found.map((f) => [f.line, f.what])).toEqual([
      [1, '[aria-label] writes no attribute: use [attr.aria-label]'],
    ]);
  });

  it('accepts marked text, marked attributes, plurals and code-only attributes', () => {
    const found = unmarkedIn(
      `<h2 i18n>Teams</h2>
       <input i18n-placeholder placeholder="Search players" type="search" class="cw-search wide" />
       <p i18n>{n, plural, =1 {one bib} other {{{n}} bibs}}</p>
       <mat-icon svgIcon="zoom_in_map" />
       <span>{{ name }} · {{ count }}</span>`,
      'sample.html',
    );
    expect(found).toEqual([]);
  });

  it('finds nothing unmarked in the app', () => {
    const found = unmarkedInApp(ROOT).map((f) => `${f.file}:${f.line} ${f.what}: ${f.text}`);
    expect(found).toEqual([]);
  });
});
