import { ChangeDetectionStrategy, Component } from '@angular/core';
import { RouterLink, RouterOutlet } from '@angular/router';

/**
 * The frame of the pages anyone may open (sign in, create a club, join by invitation, status):
 * the brand on the teal bar, in plain markup so the first screen costs no toolbar, drawer or menu.
 */
@Component({
  selector: 'cw-public-frame',
  imports: [RouterOutlet, RouterLink],
  template: `
    <header class="cw-public-bar cw-no-print">
      <a class="cw-brand" routerLink="/" aria-label="Conewise, this week">
        <img src="assets/favicon.svg" alt="" width="28" height="28" />
        <span>Conewise</span>
      </a>
    </header>
    <main id="main"><router-outlet /></main>
  `,
  styles: `
    :host {
      display: flex;
      flex-direction: column;
      min-height: 100vh;
    }
    .cw-public-bar {
      display: flex;
      align-items: center;
      height: 64px;
      padding: 0 16px;
      background: var(--mat-sys-primary);
      color: var(--mat-sys-on-primary);
    }
    .cw-brand {
      display: inline-flex;
      align-items: center;
      gap: 8px;
      color: inherit;
      text-decoration: none;
      font-size: 1.25rem;
      font-weight: 700;
      letter-spacing: 0.02em;
    }
    @media (max-width: 599px) {
      .cw-public-bar {
        height: 56px;
      }
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PublicFrame {}
