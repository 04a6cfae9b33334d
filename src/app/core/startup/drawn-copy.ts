import { DEVICE_KEY_PREFIX } from '../auth/device-data';

/**
 * The plan page as this device last drew it, shown at once on the next visit while the app starts
 * underneath (on a slow phone that takes over a second even with every file on the phone).
 *
 * Kept: the markup inside <cw-root> once the page's first phase is drawn, the component styles
 * then in <head>, the address, the signed-in person and the build. Shown only for the same address,
 * person and build, inside a closed shadow root laid over the page (so nothing in it can be
 * focused, clicked or found by assistive technology), until the app has drawn the page itself.
 * It holds what the plan page shows, children's first names included, like the service worker's
 * offline copy of the plan: it is one entry under the device prefix, so signing out removes it
 * (core/auth/device-data.ts).
 */
export const DRAWN_COPY_KEY = `${DEVICE_KEY_PREFIX}drawn-copy`;

/** The element laid over the page while the copy shows. */
export const DRAWN_COPY_TAG = 'cw-drawn-copy';

export interface DrawnCopy {
  path: string;
  userId: string;
  /** The app's entry script: a copy drawn by another build is not shown. */
  build: string;
  title: string;
  styles: string[];
  html: string;
}

function buildOf(doc: Document): string {
  return doc.querySelector<HTMLScriptElement>('script[type="module"][src*="main-"]')?.src ?? '';
}

/** Keeps the page as drawn now for `path`, replacing the copy before; a full storage keeps nothing. */
export function keepDrawnCopy(doc: Document, storage: Storage, path: string, userId: string): void {
  const root = doc.querySelector('cw-root');
  if (!root) return;
  const copy: DrawnCopy = {
    path,
    userId,
    build: buildOf(doc),
    title: doc.title,
    styles: Array.from(doc.head.querySelectorAll('style')).map((style) => style.textContent ?? ''),
    html: root.innerHTML,
  };
  try {
    storage.setItem(DRAWN_COPY_KEY, JSON.stringify(copy));
  } catch {
    // Over the storage quota: no copy, and no old one of another page either.
    storage.removeItem(DRAWN_COPY_KEY);
  }
}

function storedCopy(storage: Storage): DrawnCopy | null {
  try {
    const parsed = JSON.parse(storage.getItem(DRAWN_COPY_KEY) ?? 'null') as DrawnCopy | null;
    return parsed && typeof parsed.html === 'string' && Array.isArray(parsed.styles) ? parsed : null;
  } catch {
    return null;
  }
}

function sheet(css: string): CSSStyleSheet | null {
  try {
    const made = new CSSStyleSheet();
    made.replaceSync(css);
    return made;
  } catch {
    return null;
  }
}

/** The rules of the page's own stylesheets (the build's styles.css), for use inside the copy. */
function pageRules(doc: Document): string {
  const rules: string[] = [];
  for (const styleSheet of Array.from(doc.styleSheets)) {
    try {
      for (const rule of Array.from(styleSheet.cssRules)) rules.push(rule.cssText);
    } catch {
      // A sheet whose rules cannot be read (not this origin's): the copy does without it.
    }
  }
  return rules.join('\n');
}

/**
 * Lays the kept copy over the page when it was drawn at `path`, for `userId`, by this build, and
 * hides the app's root meanwhile (still laid out, so the app measures itself as usual). True when
 * shown. Read before the app starts.
 */
export function showDrawnCopy(doc: Document, storage: Storage, path: string, userId: string): boolean {
  const copy = storedCopy(storage);
  const root = doc.querySelector<HTMLElement>('cw-root');
  if (!copy || !root || copy.path !== path || copy.userId !== userId || copy.build !== buildOf(doc))
    return false;
  const host = doc.createElement(DRAWN_COPY_TAG);
  host.setAttribute('aria-hidden', 'true');
  host.inert = true;
  host.style.cssText = 'position:fixed;inset:0;z-index:10;overflow:hidden;display:block';
  const shadow = host.attachShadow({ mode: 'closed' });
  const sheets = [pageRules(doc), ...copy.styles].map(sheet).filter((s): s is CSSStyleSheet => !!s);
  shadow.adoptedStyleSheets = sheets;
  shadow.innerHTML = `<div class="cw-drawn-copy-page">${copy.html}</div>`;
  root.style.visibility = 'hidden';
  doc.body.insertBefore(host, root);
  doc.title = copy.title;
  return true;
}

/** Takes the copy away and shows the app's own page (nothing to do when no copy was shown). */
export function removeDrawnCopy(doc: Document): void {
  doc.querySelector(DRAWN_COPY_TAG)?.remove();
  const root = doc.querySelector<HTMLElement>('cw-root');
  if (root) root.style.visibility = '';
}
