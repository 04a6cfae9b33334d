import { ChangeDetectionStrategy, Component, signal } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { MatIconRegistry } from '@angular/material/icon';
import { firstValueFrom } from 'rxjs';
import { ICON_PATHS } from './generated/icon-svgs';
import { ICON_NAMES, type IconName } from './icon-names';
import { ICONS } from './shipped-icon';

@Component({
  selector: 'cw-icon-host',
  imports: [...ICONS],
  template: `<mat-icon svgIcon="menu" /><mat-icon [svgIcon]="turn()" />`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
class IconHost {
  readonly turn = signal<IconName>('keyboard_arrow_down');
}

const pathOf = (icon: Element) => icon.querySelector('svg > path')?.getAttribute('d');

// Every unit test gets provideIcons() from src/test-providers.ts, as the app gets it from app.config.ts.
// (Importing provide-icons.ts here as well would make the test build share it in a chunk that loads
// Angular Material before the JIT compiler, and the run fails.)
describe('provideIcons', () => {
  it('registers every shipped icon with its own path, in the shared 960-unit viewBox', async () => {
    const registry = TestBed.inject(MatIconRegistry);
    for (const name of ICON_NAMES) {
      const svg = await firstValueFrom(registry.getNamedSvgIcon(name));
      expect(svg.getAttribute('viewBox'), name).toBe('0 -960 960 960');
      expect(svg.querySelectorAll('path').length, name).toBe(1);
      expect(svg.querySelector('path')!.getAttribute('d'), name).toBe(ICON_PATHS[name]);
    }
  });

  it('draws <mat-icon svgIcon> inline, painted in the text colour, and follows a bound name', async () => {
    const fixture = TestBed.createComponent(IconHost);
    await fixture.whenStable();
    const [fixed, bound] = Array.from((fixture.nativeElement as HTMLElement).querySelectorAll('mat-icon'));
    expect(pathOf(fixed)).toBe(ICON_PATHS.menu);
    expect(pathOf(bound)).toBe(ICON_PATHS.keyboard_arrow_down);
    // No fill of its own: mat-icon's `fill: currentColor` gives the icon the colour of the text around it.
    expect(fixed.querySelector('[fill]')).toBeNull();
    expect(fixed.textContent).toBe('');

    fixture.componentInstance.turn.set('keyboard_arrow_up');
    await fixture.whenStable();
    expect(pathOf(bound)).toBe(ICON_PATHS.keyboard_arrow_up);
  });
});
