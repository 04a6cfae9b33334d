import { ChangeDetectionStrategy, Component } from '@angular/core';
import { RouterLink } from '@angular/router';

/** Conewise's mark and name, a link home: on the signed-in toolbar and on the public pages' bar. */
@Component({
  selector: 'cw-brand',
  imports: [RouterLink],
  template: `
    <a
      class="cw-brand"
      routerLink="/"
      aria-label="Conewise, this week"
      i18n-aria-label="Link to the This week page"
    >
      <img src="assets/favicon.svg" alt="" width="28" height="28" />
      <span i18n="The product's name">Conewise</span>
    </a>
  `,
  styles: `
    .cw-brand {
      display: inline-flex;
      align-items: center;
      gap: 8px;
      color: inherit;
      text-decoration: none;
      font-weight: 700;
      letter-spacing: 0.02em;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Brand {}
