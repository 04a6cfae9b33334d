import { HttpErrorResponse } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, DestroyRef, computed, inject, signal } from '@angular/core';
import { DOCUMENT } from '@angular/common';
import { Meta } from '@angular/platform-browser';
import type { HelperViewDto } from '../../../../shared/types';
import { HelperLinksApi } from '../../core/api/helper-links-api';
import { problemMessage } from '../../core/http/problem-message';
import { ICONS } from '../../core/icons/shipped-icon';
import { KIND_LABELS } from '../../core/labels/plan-labels';
import { dayWords, timeWords } from '../../core/locale/locale-format';
import { untilWords } from '../../core/time/link-expiry';
import { PhaseTimeline } from '../plans/components/phase-timeline';
import { PlanNotices } from '../plans/components/plan-notices';
import { StationCard } from '../plans/components/station-card';
import { breakWords, changeoverWords, isBreak } from '../plans/services/plan-words';
import { UnitChoice } from '../../core/units/unit-choice';
import { DEFAULT_UNITS } from '../../../../shared/units';

/** A token as the server makes them: 32 random bytes in base64url. */
const TOKEN = /^[A-Za-z0-9_-]{43}$/;
/** The tab keeps the token, so a tap on a timeline slot (which replaces the #fragment) loses nothing. */
const TAB_KEY = 'conewise.helper-token';

type Loaded =
  | { state: 'loading' }
  | { state: 'ready'; view: HelperViewDto }
  | { state: 'ended' | 'unknown' | 'failed'; message: string };

/**
 * The read-only plan for a parent helper without an account: timings, stations with their
 * groups (first names only), areas, diagrams and coaching points, and the safety caution. The
 * token comes from the address's fragment, which the browser never sends, and goes to the API in
 * a header only.
 */
@Component({
  selector: 'cw-helper-view-page',
  imports: [...ICONS, PhaseTimeline, PlanNotices, StationCard],
  templateUrl: './helper-view-page.html',
  styleUrls: ['../plans/plan-page.scss', './helper-view-page.scss'],
  // The helper is not signed in: the page reads in the units its link carries, and so do the
  // station cards and diagrams inside it.
  providers: [UnitChoice],
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class HelperViewPage {
  private readonly api = inject(HelperLinksApi);
  private readonly document = inject(DOCUMENT);
  private readonly units = inject(UnitChoice);

  protected readonly loaded = signal<Loaded>({ state: 'loading' });
  protected readonly kindLabels = KIND_LABELS;
  protected readonly isBreak = isBreak;
  protected readonly breakWords = breakWords;
  protected readonly until = untilWords;
  /** The plan as the helper reads it: the engine's texts (notes, safety) in the link's units. */
  protected readonly view = computed(() => {
    const loaded = this.loaded();
    return loaded.state === 'ready' ? this.units.deep(loaded.view) : null;
  });
  protected readonly names = computed<ReadonlyMap<string, string>>(
    () => new Map(Object.entries(this.view()?.names ?? {})),
  );
  protected readonly changeovers = computed(() => {
    const phases = this.view()?.phases ?? [];
    return phases.map((_, i) => changeoverWords(phases, i));
  });

  constructor() {
    // Not for search engines: the page is one family's evening, not the club's shop window.
    const meta = inject(Meta);
    meta.updateTag({ name: 'robots', content: 'noindex, nofollow' });
    inject(DestroyRef).onDestroy(() => meta.removeTag('name="robots"'));
    this.open(this.token());
  }

  /** The token from the address (#…), else the one this tab already read. */
  private token(): string | null {
    const fromHash = this.document.location.hash.replace(/^#/, '');
    const storage = this.document.defaultView?.sessionStorage;
    if (TOKEN.test(fromHash)) {
      storage?.setItem(TAB_KEY, fromHash);
      return fromHash;
    }
    return storage?.getItem(TAB_KEY) ?? null;
  }

  private open(token: string | null): void {
    if (!token) {
      this.loaded.set({
        state: 'unknown',
        message: $localize`This link is not complete. Open the whole link from the message the coach sent.`,
      });
      return;
    }
    this.api.view(token).subscribe({
      next: (view) => {
        // A copy saved before links carried units reads in metres and °C, as it did then.
        this.units.readAs(view.units ?? DEFAULT_UNITS);
        this.loaded.set({ state: 'ready', view });
      },
      error: (error: unknown) => {
        const status = error instanceof HttpErrorResponse ? error.status : 0;
        const state = status === 410 ? 'ended' : status === 404 ? 'unknown' : 'failed';
        this.loaded.set({ state, message: problemMessage(error) });
      },
    });
  }

  /** "Tuesday 8 December, kick-off 18:00" in the reader's locale; the plan's own date, read as a calendar day. */
  protected when(view: HelperViewDto): string {
    if (!view.date) return '';
    const day = dayWords(view.date, 'long-day');
    if (!view.kickOff) return day;
    const time = timeWords(view.kickOff);
    return view.kind === 'match-warm-up'
      ? $localize`:The day of a match warm-up and its kick-off time:${day}:day:, kick-off ${time}:time:`
      : $localize`:The day of a training session and its start time:${day}:day:, start ${time}:time:`;
  }
}
