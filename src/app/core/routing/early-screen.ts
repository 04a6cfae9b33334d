import type { Route, Routes } from '@angular/router';

/**
 * The routes, outermost first, that the router will activate for `path` ("/plans/42"), or an
 * empty list when none has code to fetch (an eager screen, a redirect, a path no route knows).
 * It follows the route table's own paths (":param" matches any one segment; a parent's children
 * take the rest) so that no screen's address is written twice.
 */
export function routesFor(path: string, routes: Routes): Route[] {
  const segments = path.split(/[?#]/)[0]!.split('/').filter(Boolean);
  return match(segments, routes) ?? [];
}

function match(segments: readonly string[], routes: Routes): Route[] | null {
  for (const route of routes) {
    if (route.redirectTo !== undefined || route.path === undefined || route.path === '**') continue;
    const own = route.path.split('/').filter(Boolean);
    if (own.length > segments.length) continue;
    if (!own.every((part, i) => part.startsWith(':') || part === segments[i])) continue;
    const rest = segments.slice(own.length);
    if (route.children) {
      const inner = match(rest, route.children);
      if (inner) return [route, ...inner];
    } else if (rest.length === 0) {
      return [route];
    }
  }
  return null;
}

/**
 * Starts fetching the code of the screen at `path` and of the frames around it, before the app
 * has started: the router asks for the same modules once its guards have run, and finds them
 * already on their way instead of starting a second wait after start-up.
 */
export function loadScreenEarly(path: string, routes: Routes): void {
  for (const route of routesFor(path, routes)) {
    // A failed fetch is the router's to report when it asks for the module itself.
    void Promise.resolve(route.loadComponent?.()).catch(() => undefined);
  }
}
