import { ChangeDetectionStrategy, Component, effect, inject, input, signal } from '@angular/core';
import { Clipboard } from '@angular/cdk/clipboard';
import { MatButtonModule } from '@angular/material/button';
import type { CreatedHelperLinkDto, HelperLinkDto } from '../../../../../shared/types';
import { HelperLinksApi } from '../../../core/api/helper-links-api';
import { problemMessage } from '../../../core/http/problem-message';
import { ICONS } from '../../../core/icons/shipped-icon';
import { madeWords, untilWords } from '../../../core/time/link-expiry';

/**
 * Read-only links for parent helpers without an account: make one and copy it, see the links that
 * still work and stop any of them.
 */
@Component({
  selector: 'cw-helper-links',
  imports: [MatButtonModule, ...ICONS],
  template: `
    <section class="cw-helper-links" aria-labelledby="helper-links-heading" data-testid="helper-links">
      <h3 id="helper-links-heading" i18n>A link for a parent helper</h3>
      <p class="cw-muted" i18n>
        Opens the plan on a phone without an account: stations, groups with first names only, areas, diagrams
        and timings. It works until the end of the day after the session.
      </p>
      <button
        mat-stroked-button
        type="button"
        (click)="make()"
        [disabled]="making()"
        data-testid="helper-link-make"
      >
        <mat-icon svgIcon="link" aria-hidden="true" />
        <ng-container i18n="Button that makes a read-only link to the plan for a parent helper"
          >Make a helper link</ng-container
        >
      </button>
      @if (made(); as link) {
        <div class="cw-new-link">
          <input
            readonly
            [value]="link.url"
            i18n-aria-label
            aria-label="Helper link"
            (focus)="selectAll($event)"
            data-testid="helper-link-url"
          />
          <button mat-flat-button type="button" (click)="copy(link.url)" data-testid="helper-link-copy">
            <mat-icon svgIcon="content_copy" aria-hidden="true" />
            <ng-container i18n="Button that copies the link (verb)">Copy</ng-container>
          </button>
        </div>
        <p
          class="cw-muted"
          role="status"
          i18n="Under a new helper link; the first sentence shows once the link is copied"
        >
          @if (copied()) {
            Copied.
          }
          Works until {{ until(link.expiresAt) }}. Send it only to the helper: anyone with the link sees the
          plan.
        </p>
      }
      @if (error(); as text) {
        <p class="cw-form-error" role="alert">{{ text }}</p>
      }
      @if (links().length) {
        <h4 i18n>Links that work now</h4>
        <ul class="cw-link-list" data-testid="helper-link-list">
          @for (link of links(); track link.id) {
            <li data-testid="helper-link-item">
              <span>{{ linkLine(link) }}</span>
              <button
                mat-button
                type="button"
                (click)="revoke(link)"
                [disabled]="stopping() === link.id"
                data-testid="helper-link-revoke"
                i18n="Button that stops a helper link from working"
              >
                Stop link
              </button>
            </li>
          }
        </ul>
      }
    </section>
  `,
  styles: `
    .cw-helper-links {
      border-top: 1px solid var(--mat-sys-outline-variant);
      margin-top: 8px;
      padding-top: 8px;
    }
    h3 {
      font: var(--mat-sys-title-small);
      margin: 0 0 4px;
    }
    h4 {
      font: var(--mat-sys-label-large);
      margin: 12px 0 4px;
    }
    .cw-new-link {
      display: flex;
      gap: 8px;
      align-items: center;
      margin-top: 8px;
    }
    .cw-new-link input {
      flex: 1;
      min-width: 0;
      min-height: 40px;
      padding: 0 8px;
      font: inherit;
      border: 1px solid var(--mat-sys-outline);
      border-radius: 8px;
      background: var(--mat-sys-surface-container-low);
      color: inherit;
    }
    .cw-link-list {
      list-style: none;
      margin: 0;
      padding: 0;
    }
    .cw-link-list li {
      display: flex;
      align-items: center;
      justify-content: space-between;
      gap: 8px;
      padding: 4px 0;
      border-bottom: 1px solid var(--mat-sys-outline-variant);
    }
    .cw-link-list button {
      flex: none;
      white-space: nowrap;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class HelperLinks {
  private readonly api = inject(HelperLinksApi);
  private readonly clipboard = inject(Clipboard);

  /** The plan the links open. */
  readonly planId = input.required<string>();

  protected readonly links = signal<HelperLinkDto[]>([]);
  protected readonly made = signal<CreatedHelperLinkDto | null>(null);
  protected readonly making = signal(false);
  protected readonly copied = signal(false);
  protected readonly stopping = signal<string | null>(null);
  protected readonly error = signal<string | null>(null);
  protected readonly until = untilWords;

  constructor() {
    effect(() => this.load(this.planId()));
  }

  /** Counts list requests, so an answer overtaken by a newer request (after a make) is dropped. */
  private listRequests = 0;

  private load(planId: string): void {
    const request = ++this.listRequests;
    this.api.list(planId).subscribe({
      next: (links) => {
        if (request === this.listRequests) this.links.set(links);
      },
      // Members who may not make links simply see none.
      error: () => {
        if (request === this.listRequests) this.links.set([]);
      },
    });
  }

  protected make(): void {
    this.making.set(true);
    this.error.set(null);
    this.copied.set(false);
    this.api.create(this.planId()).subscribe({
      next: (link) => {
        this.making.set(false);
        this.made.set(link);
        this.links.update((links) => [link, ...links.filter((l) => l.id !== link.id)]);
        this.load(this.planId());
      },
      error: (error: unknown) => {
        this.making.set(false);
        this.error.set(problemMessage(error));
      },
    });
  }

  /** "Made Tue 1 Dec by Rhea Coach · e-mailed to 2 people · until Wed 2 Dec": one link in the list. */
  protected linkLine(link: HelperLinkDto): string {
    const made = madeWords(link.createdAt);
    const parts = [
      link.createdByName
        ? $localize`:When a helper link was made and by whom:Made ${made}:madeAt: by ${link.createdByName}:madeBy:`
        : $localize`:When a helper link was made:Made ${made}:madeAt:`,
    ];
    if (link.emailedTo) {
      parts.push(
        link.emailedTo === 1
          ? $localize`:How many people a helper link was e-mailed to:e-mailed to 1 person`
          : $localize`:How many people a helper link was e-mailed to:e-mailed to ${link.emailedTo}:count: people`,
      );
    }
    parts.push($localize`:Until when a helper link works:until ${untilWords(link.expiresAt)}:until:`);
    return parts.join(' · ');
  }

  protected copy(url: string): void {
    this.copied.set(this.clipboard.copy(url));
  }

  protected selectAll(event: Event): void {
    (event.target as HTMLInputElement).select();
  }

  protected revoke(link: HelperLinkDto): void {
    this.stopping.set(link.id);
    this.error.set(null);
    this.api.revoke(this.planId(), link.id).subscribe({
      next: () => {
        this.stopping.set(null);
        this.links.update((links) => links.filter((l) => l.id !== link.id));
        if (this.made()?.id === link.id) this.made.set(null);
        this.load(this.planId());
      },
      error: (error: unknown) => {
        this.stopping.set(null);
        this.error.set(problemMessage(error));
      },
    });
  }
}
