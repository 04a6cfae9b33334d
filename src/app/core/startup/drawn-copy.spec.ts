import { forgetDeviceData } from '../auth/device-data';
import { DRAWN_COPY_KEY, DRAWN_COPY_TAG, keepDrawnCopy, removeDrawnCopy, showDrawnCopy } from './drawn-copy';

const COMPONENT_STYLE = '.cw-phase[_ngcontent-ng-c1]{margin:0}';

/** A page with the build's entry script and the app drawn in <cw-root>. */
function drawnApp(markup: string): HTMLElement {
  const script = document.createElement('script');
  script.type = 'module';
  script.src = '/en-GB/main-AB12CD34.js';
  document.body.append(script);
  const style = document.createElement('style');
  style.textContent = COMPONENT_STYLE;
  style.dataset['test'] = 'drawn-copy';
  document.head.append(style);
  const root = document.createElement('cw-root');
  root.innerHTML = markup;
  document.body.append(root);
  return root;
}

/** The same document after a reload: the entry script and an empty root, before the app starts. */
function reloaded(): HTMLElement {
  const root = document.querySelector<HTMLElement>('cw-root')!;
  root.innerHTML = '';
  // Only this file's own: other specs in the same document keep theirs.
  for (const style of Array.from(document.head.querySelectorAll('style[data-test="drawn-copy"]')))
    style.remove();
  return root;
}

describe('the copy of the plan page for the next visit', () => {
  afterEach(() => {
    for (const style of Array.from(document.head.querySelectorAll('style[data-test="drawn-copy"]')))
      style.remove();
    document.querySelector(DRAWN_COPY_TAG)?.remove();
    document.querySelector('cw-root')?.remove();
    for (const script of Array.from(document.querySelectorAll('script[type="module"]'))) script.remove();
    localStorage.clear();
  });

  it('keeps the drawn markup, the component styles, the address, the person and the build', () => {
    drawnApp('<h1 data-testid="plan-title">Match warm-up · U12 Otters</h1>');
    document.title = 'Plan · Conewise';
    keepDrawnCopy(document, localStorage, '/plans/p1', 'coach-1');
    const kept = JSON.parse(localStorage.getItem(DRAWN_COPY_KEY)!);
    expect(kept).toEqual({
      path: '/plans/p1',
      userId: 'coach-1',
      build: expect.stringContaining('/en-GB/main-AB12CD34.js'),
      title: 'Plan · Conewise',
      // Every style in <head> (other specs may have left theirs in this document).
      styles: expect.arrayContaining([COMPONENT_STYLE]),
      html: '<h1 data-testid="plan-title">Match warm-up · U12 Otters</h1>',
    });
  });

  it('shows it over the hidden app at the same address for the same person, then takes it away', () => {
    drawnApp('<h1>Match warm-up · U12 Otters</h1>');
    keepDrawnCopy(document, localStorage, '/plans/p1', 'coach-1');
    const root = reloaded();

    expect(showDrawnCopy(document, localStorage, '/plans/p1', 'coach-1')).toBe(true);
    const host = document.querySelector<HTMLElement>(DRAWN_COPY_TAG)!;
    expect(host.nextElementSibling).toBe(root);
    expect(host.getAttribute('aria-hidden')).toBe('true');
    // Closed: nothing in it can be reached from the page (or by a test's selectors).
    expect(host.shadowRoot).toBeNull();
    expect(root.style.visibility).toBe('hidden');

    removeDrawnCopy(document);
    expect(document.querySelector(DRAWN_COPY_TAG)).toBeNull();
    expect(root.style.visibility).toBe('');
  });

  it('shows nothing for another address, another person, another build or no copy', () => {
    drawnApp('<h1>Plan</h1>');
    keepDrawnCopy(document, localStorage, '/plans/p1', 'coach-1');
    reloaded();
    expect(showDrawnCopy(document, localStorage, '/plans/p2', 'coach-1')).toBe(false);
    expect(showDrawnCopy(document, localStorage, '/plans/p1', 'coach-2')).toBe(false);
    document.querySelector<HTMLScriptElement>('script[type="module"]')!.src = '/en-GB/main-EF56GH78.js';
    expect(showDrawnCopy(document, localStorage, '/plans/p1', 'coach-1')).toBe(false);
    localStorage.setItem(DRAWN_COPY_KEY, '{not json');
    expect(showDrawnCopy(document, localStorage, '/plans/p1', 'coach-1')).toBe(false);
    expect(document.querySelector(DRAWN_COPY_TAG)).toBeNull();
    expect(document.querySelector<HTMLElement>('cw-root')!.style.visibility).toBe('');
  });

  it('keeps nothing, not even an older copy, when the storage is full', () => {
    drawnApp('<h1>Plan</h1>');
    localStorage.setItem(DRAWN_COPY_KEY, '{"path":"/plans/old"}');
    const full = {
      setItem: () => {
        throw new DOMException('quota', 'QuotaExceededError');
      },
      removeItem: (key: string) => localStorage.removeItem(key),
    } as unknown as Storage;
    keepDrawnCopy(document, full, '/plans/p1', 'coach-1');
    expect(localStorage.getItem(DRAWN_COPY_KEY)).toBeNull();
  });

  it('is forgotten when the person signs out', async () => {
    drawnApp('<h1>Plan</h1>');
    keepDrawnCopy(document, localStorage, '/plans/p1', 'coach-1');
    await forgetDeviceData(localStorage, undefined);
    expect(localStorage.getItem(DRAWN_COPY_KEY)).toBeNull();
  });
});
