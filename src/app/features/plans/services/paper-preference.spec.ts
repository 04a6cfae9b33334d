import { TestBed } from '@angular/core/testing';
import { PaperPreference, paperForLocale } from './paper-preference';

describe('paperForLocale', () => {
  it('suggests Letter for the regions that mostly print on it and for Filipino', () => {
    for (const locale of ['en-US', 'en-CA', 'fr-CA', 'es-MX', 'en-PH', 'fil', 'fil-PH', 'en_us']) {
      expect(paperForLocale(locale), locale).toBe('letter');
    }
  });

  it('suggests A4 everywhere else, and when the browser names no locale', () => {
    for (const locale of [
      'en-GB',
      'en',
      'de-DE',
      'es',
      'es-ES',
      'fr',
      'pt-BR',
      'zh-Hant-TW',
      undefined,
      '',
    ]) {
      expect(paperForLocale(locale), String(locale)).toBe('a4');
    }
  });
});

describe('PaperPreference', () => {
  afterEach(() => {
    localStorage.clear();
    vi.restoreAllMocks();
  });

  it("starts from the locale, then keeps the coach's choice over it", () => {
    vi.spyOn(navigator, 'languages', 'get').mockReturnValue(['en-US']);
    const preference = TestBed.inject(PaperPreference);
    expect(preference.paper()).toBe('letter');
    preference.choose('a4');
    expect(preference.paper()).toBe('a4');
    expect(localStorage.getItem('conewise.paper')).toBe('a4');
    TestBed.resetTestingModule();
    expect(TestBed.inject(PaperPreference).paper()).toBe('a4');
  });

  it('ignores a stored value it does not know', () => {
    vi.spyOn(navigator, 'languages', 'get').mockReturnValue(['en-GB']);
    localStorage.setItem('conewise.paper', 'tabloid');
    expect(TestBed.inject(PaperPreference).paper()).toBe('a4');
  });
});
