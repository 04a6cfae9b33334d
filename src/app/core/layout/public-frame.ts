import { ChangeDetectionStrategy, Component } from '@angular/core';
import { RouterOutlet } from '@angular/router';
import { Brand } from './brand';

/**
 * The frame of the pages anyone may open (sign in, create a club, join by invitation, status):
 * the brand on the teal bar, in plain markup so the first screen costs no toolbar, drawer or menu.
 */
@Component({
  selector: 'cw-public-frame',
  imports: [RouterOutlet, Brand],
  template: `
    <header class="cw-public-bar cw-no-print">
      <cw-brand />
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
      font-size: 1.25rem;
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
