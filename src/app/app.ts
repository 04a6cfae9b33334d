import { ChangeDetectionStrategy, Component, computed, inject, viewChild } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatListModule } from '@angular/material/list';
import { MatMenuModule } from '@angular/material/menu';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSidenav, MatSidenavModule } from '@angular/material/sidenav';
import { MatToolbarModule } from '@angular/material/toolbar';
import { NavigationEnd, Router, RouterLink, RouterLinkActive, RouterOutlet } from '@angular/router';
import { filter, map } from 'rxjs';
import { AuthStore } from './core/auth/auth-store';
import { LoadingState } from './core/http/loading-state';
import { ICONS } from './core/icons/shipped-icon';
import { mediaMatches, PHONE_WIDTH_QUERY } from './core/layout/media-query';
import { NAV_ITEMS } from './core/layout/nav-items';

/** The app shell: toolbar, navigation drawer, one progress bar, and the routed page. */
@Component({
  selector: 'cw-root',
  imports: [
    RouterOutlet,
    RouterLink,
    RouterLinkActive,
    MatToolbarModule,
    MatSidenavModule,
    MatListModule,
    ...ICONS,
    MatButtonModule,
    MatMenuModule,
    MatProgressBarModule,
  ],
  templateUrl: './app.html',
  styleUrl: './app.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class App {
  private readonly router = inject(Router);
  protected readonly auth = inject(AuthStore);
  protected readonly loading = inject(LoadingState);
  private readonly drawer = viewChild(MatSidenav);

  /** Phones get a drawer that slides over; wider screens keep the navigation open. */
  protected readonly compact = mediaMatches(PHONE_WIDTH_QUERY);

  /** Pages that fill the screen on their own (pitch-side) or stand alone (sign-in). */
  private readonly url = toSignal(
    this.router.events.pipe(
      filter((event) => event instanceof NavigationEnd),
      map((event) => event.urlAfterRedirects),
    ),
    { initialValue: this.router.url },
  );
  protected readonly fullScreen = computed(() => /\/pitch-side(\?|$)|^\/helper([?#]|$)/.test(this.url()));

  protected readonly navItems = computed(() =>
    NAV_ITEMS.filter((item) => !item.roles || this.auth.hasRole(...item.roles)),
  );

  /** Closes the drawer after navigating on a phone. */
  protected closeDrawerOnPhone(): void {
    if (this.compact()) void this.drawer()?.close();
  }

  protected signOut(): void {
    this.auth.signOut();
    void this.router.navigate(['/sign-in']);
  }
}
