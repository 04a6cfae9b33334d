import { ChangeDetectionStrategy, Component } from '@angular/core';

/** Placeholder until the screen is built. */
@Component({
  selector: 'cw-sign-in-page',
  template: '<section class="cw-page"><h1>Sign in</h1></section>',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SignInPage {}
