import { Directive, input } from '@angular/core';
import { MatIcon } from '@angular/material/icon';
import type { IconName } from './icon-names';

/**
 * Types `svgIcon` on every `<mat-icon>` as an icon the app ships. MatIcon takes any string, so on
 * its own a misspelt or unshipped name would only show as a blank square and an error in the
 * console; with this directive beside it, strict template checking fails `ng build` instead
 * ("Type '"…"' is not assignable to type IconName"). It does nothing at run time.
 */
// It must sit on MatIcon's own element and input name, so it cannot carry the cw prefix.
// eslint-disable-next-line @angular-eslint/directive-selector
@Directive({ selector: 'mat-icon[svgIcon]' })
export class ShippedIcon {
  readonly svgIcon = input.required<IconName>();
}

/** What a component imports to show icons: `imports: [...ICONS]`, never MatIcon alone. */
export const ICONS = [MatIcon, ShippedIcon] as const;
