import { EnvironmentProviders, inject, provideAppInitializer } from '@angular/core';
import { MatIconRegistry } from '@angular/material/icon';
import { DomSanitizer } from '@angular/platform-browser';
import { ICON_PATHS } from './generated/icon-svgs';
import { ICON_NAMES } from './icon-names';

/**
 * Registers every shipped icon with MatIconRegistry, so `<mat-icon svgIcon="menu" />` draws it inline.
 * Nothing is fetched: the path data is in the bundle, and the app works on a closed network.
 */
export function provideIcons(): EnvironmentProviders {
  return provideAppInitializer(() => {
    const registry = inject(MatIconRegistry);
    const sanitizer = inject(DomSanitizer);
    for (const name of ICON_NAMES) {
      // Bypassing the sanitizer is safe here: the markup is built from constants generated at build
      // time from our own list (generated/icon-svgs.ts), never from user input or the network.
      const svg = `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 -960 960 960"><path d="${ICON_PATHS[name]}"/></svg>`;
      registry.addSvgIconLiteral(name, sanitizer.bypassSecurityTrustHtml(svg));
    }
  });
}
