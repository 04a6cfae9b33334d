import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideNoopAnimations } from '@angular/platform-browser/animations';
import type { Plan, TraceEntry } from '../../../../../shared/types';
import { WhyPanel } from './why-panel';

const CLUB_RULE: TraceEntry = {
  ruleId: 'kit.no-goals',
  description: 'Without goals, cone gates stand in for goals.',
  fired: true,
  effect: 'No small goals in the bag: gates of two cones stand in for goals.',
};
const SECOND_RULE: TraceEntry = {
  ruleId: 'heat.lower-intensity',
  description: 'In the heat the most intense activities are left out.',
  fired: true,
  effect: 'no activity above intensity 4 in the heat',
};
const NOT_FIRED: TraceEntry = {
  ruleId: 'heading.none-u11',
  description: 'No heading for U11 and younger.',
  fired: false,
};
const STEPS: TraceEntry[] = [
  { ruleId: 'engine.timing', fired: true, effect: 'Warm-up 8 min, Keep-ball 10 min, Game 7 min' },
  { ruleId: 'engine.goalkeepers', fired: true, effect: '2 goalkeepers warm up as keepers in Warm-up' },
  { ruleId: 'edit.resize-area', fired: true, effect: 'Rondo 4v1: area larger' },
];

function planWith(trace: TraceEntry[]): Plan {
  return {
    trace,
    ruleSet: { id: 'rs-7f3a', version: 4 },
    seed: 'seed-91c2',
    estimateNote: 'Touches are estimates from each activity’s usual rate.',
  } as Plan;
}

function render(trace: TraceEntry[]) {
  TestBed.configureTestingModule({
    imports: [WhyPanel],
    providers: [provideHttpClient(), provideHttpClientTesting(), provideNoopAnimations()],
  });
  const fixture = TestBed.createComponent(WhyPanel);
  fixture.componentRef.setInput('plan', planWith(trace));
  fixture.detectChanges();
  const el = fixture.nativeElement as HTMLElement;
  const text = (selector: string) =>
    (el.querySelector(selector)?.textContent ?? '').replace(/\s+/g, ' ').trim();
  /** What shows without opening the Details fold. */
  const outsideDetails = () => {
    const copy = el.cloneNode(true) as HTMLElement;
    copy.querySelector('[data-testid=why-details]')?.remove();
    return (copy.textContent ?? '').replace(/\s+/g, ' ');
  };
  return { fixture, el, text, outsideDetails, http: TestBed.inject(HttpTestingController) };
}

describe('WhyPanel', () => {
  it('counts the club’s rules apart from the planner’s steps, with singular and plural', () => {
    expect(render([CLUB_RULE, NOT_FIRED, ...STEPS]).text('[data-testid=why-count]')).toBe(
      '1 club rule applied · 3 planner steps',
    );
    TestBed.resetTestingModule();
    expect(render([CLUB_RULE, SECOND_RULE, STEPS[0]]).text('[data-testid=why-count]')).toBe(
      '2 club rules applied · 1 planner step',
    );
    TestBed.resetTestingModule();
    const none = render([NOT_FIRED]);
    expect(none.text('[data-testid=why-count]')).toBe('No club rules applied · no planner steps');
    expect(none.el.textContent).toContain('None of the club’s rules changed this plan.');
    expect(none.el.querySelector('[data-testid=why-planner]')).toBeNull();
  });

  it('says what each club rule did in its own sentence, and lists the planner’s steps apart', () => {
    const { el } = render([CLUB_RULE, NOT_FIRED, SECOND_RULE, ...STEPS]);
    const rules = Array.from(el.querySelectorAll('[data-testid=why-club-rules] li')).map((li) =>
      (li.textContent ?? '').replace(/\s+/g, ' ').trim(),
    );
    expect(rules).toEqual([
      `${CLUB_RULE.description} — ${CLUB_RULE.effect}`,
      `${SECOND_RULE.description} — ${SECOND_RULE.effect}`,
    ]);
    const steps = Array.from(el.querySelectorAll('[data-testid=why-planner] li')).map((li) =>
      (li.textContent ?? '').trim(),
    );
    expect(steps).toEqual(STEPS.map((s) => s.effect));
    // A rule that did not apply is not among what the rules did.
    expect(el.querySelector('[data-testid=why-club-rules]')?.textContent).not.toContain(
      NOT_FIRED.description,
    );
  });

  it('keeps ids, the rules’ version and the plan ref inside the Details fold only', () => {
    const { text, outsideDetails } = render([CLUB_RULE, NOT_FIRED, ...STEPS]);
    const shown = outsideDetails();
    for (const code of [
      'kit.no-goals',
      'heading.none-u11',
      'engine.timing',
      'edit.',
      'rs-7f3a',
      'seed-91c2',
    ]) {
      expect(shown).not.toContain(code);
    }
    expect(shown).not.toMatch(/version 4/);
    const details = text('[data-testid=why-details]');
    expect(details).toContain('Rules rs-7f3a, version 4 · plan ref seed-91c2');
    expect(details).toContain('kit.no-goals applied');
    expect(details).toContain('heading.none-u11 checked, did not apply');
    expect(details).toContain('engine.timing applied');
  });

  it('names the rules in words once opened, and says just “Club rules” when they cannot be read', () => {
    const { fixture, el, text, http } = render([CLUB_RULE]);
    expect(text('[data-testid=why-rules]')).toBe('Club rules');
    (el.querySelector('mat-expansion-panel-header') as HTMLElement).click();
    fixture.detectChanges();
    http.expectOne('/api/rule-sets/rs-7f3a/summary').flush({
      id: 'rs-7f3a',
      name: 'Fernmoor rules',
      version: 4,
      status: 'published',
      publishedAt: null,
      builtIn: false,
    });
    fixture.detectChanges();
    expect(text('[data-testid=why-rules]')).toBe('Club rules: Fernmoor rules');
    http.verify();

    TestBed.resetTestingModule();
    const offline = render([CLUB_RULE]);
    (offline.el.querySelector('mat-expansion-panel-header') as HTMLElement).click();
    offline.fixture.detectChanges();
    offline.http
      .expectOne('/api/rule-sets/rs-7f3a/summary')
      .flush(null, { status: 503, statusText: 'Service Unavailable' });
    offline.fixture.detectChanges();
    expect(offline.text('[data-testid=why-rules]')).toBe('Club rules');
  });
});
