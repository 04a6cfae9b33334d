import {
  ChangeDetectionStrategy,
  Component,
  computed,
  effect,
  inject,
  input,
  output,
  signal,
} from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import type { RuleSetDto } from '../../../../shared/types';
import type { RuleSetChangeDto } from '../../../../shared/types/rule-set-api';
import { problemMessage } from '../../core/http/problem-message';
import { ICONS } from '../../core/icons/shipped-icon';
import { momentWords } from '../../core/locale/locale-format';
import { ruleChangeWords, rulePathWords, ruleValueWords } from '../../../../shared/types/rule-words';
import { versionChanges, type JsonChange } from '../../core/engine/engine-adapter';
import { RuleSetsApi } from '../../core/api/rule-sets-api';

/** Conewise's own starting rules, as the server answers for the id "default". */
const STARTING_RULES: RuleSetDto = {
  id: 'default',
  name: $localize`Conewise starting rules`,
  version: 0,
  status: 'archived',
  body: undefined,
  authorId: '',
  authorName: 'Conewise',
  createdAt: '',
  updatedAt: '',
  revision: 0,
};

/** Changes listed under one entry of the log before "and N more". */
const SHOWN_CHANGES = 6;

/** Every version with who saved it and when, a diff between any two, and roll back. */
@Component({
  selector: 'cw-rule-history',
  imports: [MatButtonModule, ...ICONS],
  templateUrl: './rule-history.html',
  styleUrl: './rule-history.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RuleHistory {
  private readonly api = inject(RuleSetsApi);

  /** All versions, newest first. */
  readonly versions = input.required<RuleSetDto[]>();
  /** The id of the version new plans use. */
  readonly publishedId = input<string | null>(null);
  /** Asks the page to publish an earlier version again. */
  readonly rollback = output<RuleSetDto>();

  protected readonly fromId = signal<string | null>(null);
  protected readonly toId = signal<string | null>(null);
  private readonly bodies = signal<Record<string, unknown>>({});
  protected readonly error = signal<string | null>(null);
  protected readonly valueWords = ruleValueWords;
  /** "1 Dec 2026, 16:20" in the browser's locale. */
  protected readonly when = momentWords;
  /** The change log: who saved, published or rolled back what. */
  protected readonly log = signal<RuleSetChangeDto[]>([]);

  /** Every version plus Conewise's starting rules, which the first version was made from. */
  protected readonly comparable = computed<RuleSetDto[]>(() => [...this.versions(), STARTING_RULES]);
  protected readonly fromVersion = computed(
    () => this.comparable().find((v) => v.id === this.fromId()) ?? null,
  );
  protected readonly toVersion = computed(() => this.comparable().find((v) => v.id === this.toId()) ?? null);
  protected readonly changes = computed<JsonChange[] | null>(() => {
    const from = this.fromId();
    const to = this.toId();
    if (!from || !to) return null;
    const bodies = this.bodies();
    if (!(from in bodies) || !(to in bodies)) return null;
    return versionChanges(bodies[from], bodies[to]);
  });

  constructor() {
    this.api.history().subscribe({
      next: (entries) => this.log.set(entries),
      error: (error: unknown) => this.error.set(problemMessage(error)),
    });
    // Default comparison: the newest version against the one before it.
    effect(() => {
      const versions = this.versions();
      if (!this.toId() && versions[0]) this.toId.set(versions[0].id);
      if (!this.fromId() && versions[0]) this.fromId.set(versions[1]?.id ?? STARTING_RULES.id);
    });
    effect(() => {
      for (const id of [this.fromId(), this.toId()]) if (id) this.ensureBody(id);
    });
  }

  /** What a log entry did, after who did it: "saved the draft, version 4". */
  protected actionWords(entry: RuleSetChangeDto): string {
    const version = this.versionOf(entry);
    switch (entry.action) {
      case 'create':
        return $localize`:After a person's name in the change log:started a draft, version ${version}:version:`;
      case 'update':
        return $localize`:After a person's name in the change log:saved the draft, version ${version}:version:`;
      case 'publish':
        return $localize`:After a person's name in the change log:published version ${version}:version:`;
      case 'rollback':
        return $localize`:After a person's name in the change log:published earlier rules again as version ${version}:version:`;
      default:
        return $localize`:After a person's name in the change log:changed version ${version}:version:`;
    }
  }

  /** "Draft", "Published" (what new plans use) or "Earlier version". */
  protected statusWords(version: RuleSetDto): string {
    if (version.id === this.publishedId()) return $localize`:State of a version of the rules:Published`;
    return version.status === 'draft'
      ? $localize`:State of a version of the rules:Draft`
      : $localize`:State of a version of the rules:Earlier version`;
  }

  /** What a save changed, a line a place: "Group sizes › Keep-ball › Beginner › Most: 6 → 5". */
  protected changeLines(entry: RuleSetChangeDto): string[] {
    const document = this.versions().find((v) => v.id === entry.ruleSetId)?.body;
    const lines = entry.changes
      ? entry.changes.map((change) => ruleChangeWords(change, document))
      : entry.changedPaths.map((path) =>
          path === '(name)'
            ? $localize`:The name of a version of the rules:Name`
            : rulePathWords(path, document),
        );
    return lines.length > SHOWN_CHANGES + 1
      ? [
          ...lines.slice(0, SHOWN_CHANGES),
          $localize`:Last line of a shortened list of changes:and ${lines.length - SHOWN_CHANGES}:count: more changes`,
        ]
      : lines;
  }

  /** A place of the compared rules in words. */
  protected placeWords(change: JsonChange): string {
    return rulePathWords(change.path, this.bodies()[this.toId() ?? ''] ?? this.bodies()[this.fromId() ?? '']);
  }

  protected versionOf(entry: RuleSetChangeDto): number {
    return this.versions().find((v) => v.id === entry.ruleSetId)?.version ?? entry.version;
  }

  protected captionText(count: number): string {
    const from = this.fromVersion();
    const to = this.toVersion();
    const name = (v: RuleSetDto | null) =>
      v && v.id !== STARTING_RULES.id
        ? $localize`:In 3 differences from version 2 to version 4:version ${v.version}:version:`
        : $localize`:In 3 differences from the starting rules to version 1:the starting rules`;
    return count === 1
      ? $localize`1 difference from ${name(from)}:from: to ${name(to)}:to:`
      : $localize`${count}:count: differences from ${name(from)}:from: to ${name(to)}:to:`;
  }

  protected label(version: RuleSetDto): string {
    if (version.id === STARTING_RULES.id) return $localize`Conewise starting rules`;
    return $localize`:A version in the compare list, its state and who saved it:Version ${version.version}:version: · ${this.statusWords(version)}:state: · ${version.authorName}:author:`;
  }

  protected choose(which: 'from' | 'to', event: Event): void {
    const id = (event.target as HTMLSelectElement).value;
    (which === 'from' ? this.fromId : this.toId).set(id);
  }

  protected compareWithPrevious(version: RuleSetDto): void {
    const list = this.versions();
    const index = list.findIndex((v) => v.id === version.id);
    this.toId.set(version.id);
    this.fromId.set(list[index + 1]?.id ?? STARTING_RULES.id);
  }

  private ensureBody(id: string): void {
    if (id in this.bodies()) return;
    const known = this.versions().find((v) => v.id === id);
    if (known?.body && typeof known.body === 'object') {
      this.bodies.update((all) => ({ ...all, [id]: known.body }));
      return;
    }
    this.api.get(id).subscribe({
      next: (full) => this.bodies.update((all) => ({ ...all, [id]: full.body })),
      error: (error: unknown) => this.error.set(problemMessage(error)),
    });
  }
}
