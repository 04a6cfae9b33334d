import { ChangeDetectionStrategy, Component } from '@angular/core';
import { RouterLink } from '@angular/router';

/**
 * What Conewise keeps about children, who in the club sees it, how long it stays and how to take
 * it out or erase it. Anyone may read it, signed in or not (the sign-in page links here).
 */
@Component({
  selector: 'cw-privacy-page',
  imports: [RouterLink],
  templateUrl: './privacy-page.html',
  styleUrl: './privacy-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PrivacyPage {}
