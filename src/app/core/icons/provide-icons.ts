import {
  EnvironmentProviders,
  inject,
  Injectable,
  makeEnvironmentProviders,
  PendingTasks,
} from '@angular/core';
import { MatIconRegistry } from '@angular/material/icon';
import { DomSanitizer } from '@angular/platform-browser';
import { from, type Observable, switchMap } from 'rxjs';

/**
 * Angular Material's icon registry, filled with the shipped icons the first time any icon is asked
 * for. The path data (generated/icon-svgs.ts) is its own small chunk: the sign-in page, which has
 * no icons, never fetches it, and every later screen gets all icons in one request. Nothing comes
 * from outside the app, so it works on a closed network; the service worker keeps the chunk offline.
 */
@Injectable()
export class ShippedIconRegistry extends MatIconRegistry {
  private readonly sanitizer = inject(DomSanitizer);
  private readonly pendingTasks = inject(PendingTasks);
  private loading: Promise<Readonly<Record<string, string>>> | null = null;
  private paths: Readonly<Record<string, string>> | null = null;
  /** Icons handed to the registry so far: each is parsed into an SVG element only when first drawn. */
  private readonly registered = new Set<string>();

  override getNamedSvgIcon(name: string, namespace = ''): Observable<SVGElement> {
    if (this.paths) return this.drawn(name, namespace);
    return from(this.loadPaths()).pipe(switchMap(() => this.drawn(name, namespace)));
  }

  private drawn(name: string, namespace: string): Observable<SVGElement> {
    const path = namespace === '' ? this.paths?.[name] : undefined;
    if (path !== undefined && !this.registered.has(name)) {
      // Bypassing the sanitizer is safe here: the markup is built from constants generated at
      // build time from our own list, never from user input or the network.
      const svg = `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 -960 960 960"><path d="${path}"/></svg>`;
      this.addSvgIconLiteral(name, this.sanitizer.bypassSecurityTrustHtml(svg));
      this.registered.add(name);
    }
    return super.getNamedSvgIcon(name, namespace);
  }

  private loadPaths(): Promise<Readonly<Record<string, string>>> {
    // A pending task: the app (and a test's whenStable) is not stable until the icons are drawn.
    if (!this.loading) {
      const done = this.pendingTasks.add();
      this.loading = loadIconPaths()
        .then((paths) => (this.paths = paths))
        .finally(done);
    }
    return this.loading;
  }
}

let iconPaths: Promise<Readonly<Record<string, string>>> | null = null;

/**
 * The shipped icons' paths (a chunk of their own). `main.ts` asks for them as a signed-in screen
 * starts, so they arrive with the screen's code instead of one round trip after it.
 */
export function loadIconPaths(): Promise<Readonly<Record<string, string>>> {
  iconPaths ??= import('./generated/icon-svgs').then(
    ({ ICON_PATHS }) => ICON_PATHS,
    (error: unknown) => {
      // Not kept: the next icon drawn asks again (a dropped connection at start-up, say).
      iconPaths = null;
      throw error;
    },
  );
  return iconPaths;
}

/** `<mat-icon svgIcon="menu" />` draws a shipped icon inline (see ShippedIconRegistry). */
export function provideIcons(): EnvironmentProviders {
  return makeEnvironmentProviders([{ provide: MatIconRegistry, useClass: ShippedIconRegistry }]);
}
