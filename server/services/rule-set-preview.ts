import '../../shared/i18n/localize';
import type { DataSource } from 'typeorm';
import type { Plan } from '../../shared/types/plan';
import type { AgeGroup, Level, PlanRequest } from '../../shared/types/plan-request';
import type { RuleSetDocument } from '../../shared/types/plan-rules';
import type { PlanOutline, PreviewCase, RuleSetPreviewDto } from '../../shared/types/rule-set-api';
import { SessionPlan } from '../entities/session-plan';
import { Team } from '../entities/team';
import type { AuthContext } from '../http/auth-context';
import { badRequest } from '../http/problem';
import * as engine from './engine-port';
import type { RuleSetService } from './rule-set-service';

export interface PreviewInput {
  recentPlans?: number;
  ageGroup?: AgeGroup;
  level?: Level;
}

interface Case {
  label: string;
  source: PreviewCase['source'];
  request: PlanRequest;
}

/** A sample squad's player, numbered. */
function samplePlayer(place: number): string {
  return $localize`:a player of a sample squad, numbered:Player ${place}:number:`;
}

/** Squads that stress the rules: few, odd, many, a tiny patch, no goals, an hour's training with keepers. */
export function sampleRequests(ageGroup: AgeGroup, level: Level): Case[] {
  const squad = (n: number) =>
    Array.from({ length: n }, (_, i) => ({ id: `sample-${i + 1}`, name: samplePlayer(i + 1) }));
  const base = (n: number): PlanRequest => ({
    ageGroup,
    level,
    players: squad(n),
    coaches: 2,
    equipment: { balls: n + 2, cones: 40, bibs: 12, goals: 4 },
    space: { width: 40, length: 30 },
    minutes: 25,
    kind: 'match-warm-up',
    seed: 'rules-preview',
  });
  return [
    {
      label: $localize`:a sample squad the head of coaching tries draft rules on:sample: small squad (6)`,
      source: 'sample',
      request: base(6),
    },
    {
      label: $localize`:a sample squad the head of coaching tries draft rules on:sample: odd numbers (13)`,
      source: 'sample',
      request: base(13),
    },
    {
      label: $localize`:a sample squad the head of coaching tries draft rules on:sample: large squad (22)`,
      source: 'sample',
      request: base(22),
    },
    {
      label: $localize`:a sample squad the head of coaching tries draft rules on:sample: tiny space (12 on 15 × 12 m)`,
      source: 'sample',
      request: { ...base(12), space: { width: 15, length: 12 } },
    },
    {
      label: $localize`:a sample squad the head of coaching tries draft rules on:sample: no goals (12)`,
      source: 'sample',
      request: { ...base(12), equipment: { ...base(12).equipment, goals: 0 } },
    },
    {
      // Long enough for drinks breaks, a theme and the keepers' own warm-up.
      label: $localize`:a sample squad the head of coaching tries draft rules on:sample: an hour’s training with 2 goalkeepers (16)`,
      source: 'sample',
      request: {
        ...base(16),
        players: base(16).players.map((p, i) => ({ ...p, goalkeeper: i < 2 })),
        space: { width: 50, length: 60 },
        minutes: 60,
        kind: 'training',
      },
    },
  ];
}

/** "Try it": the draft against the published rules on sample squads and the club's recent plans. */
export class RuleSetPreviewService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly ruleSets: RuleSetService,
  ) {}

  async preview(auth: AuthContext, draftId: string, input: PreviewInput): Promise<RuleSetPreviewDto> {
    const manager = this.dataSource.manager;
    const draft = await this.ruleSets.resolve(manager, auth, draftId);
    const errors = engine.ruleSetErrors(draft.body);
    if (errors.length)
      throw badRequest($localize`The draft is not a valid rule set; fix it to try it.`, errors);
    const against = await this.ruleSets.resolve(manager, auth, 'published');
    const firstTeam = await manager
      .getRepository(Team)
      .findOne({ where: { clubId: auth.clubId }, order: { createdAt: 'ASC' } });
    const cases = sampleRequests(
      input.ageGroup ?? firstTeam?.ageGroup ?? 'U10',
      input.level ?? firstTeam?.level ?? 'intermediate',
    );
    const recent = await manager
      .getRepository(SessionPlan)
      .createQueryBuilder('p')
      .innerJoin(Team, 't', 't.id = p."teamId"')
      .addSelect('t.name', 'team_name')
      .where('p."clubId" = :clubId', { clubId: auth.clubId })
      .orderBy('p."createdAt"', 'DESC')
      .limit(input.recentPlans ?? 3)
      .getRawAndEntities();
    recent.entities.forEach((row, i) => {
      const teamName =
        (recent.raw[i] as { team_name?: string })?.team_name ?? $localize`:a team without a name:team`;
      const date = row.date ?? row.createdAt.toISOString().slice(0, 10);
      cases.push({
        label: $localize`:one of the club's recent plans the head of coaching tries draft rules on:recent plan: ${teamName}:teamName:, ${date}:date:`,
        source: 'recent-plan',
        request: { ...row.request, seed: row.seed },
      });
    });
    const out: PreviewCase[] = [];
    for (const c of cases) {
      const current = await outlineWith(c.request, against.body);
      const next = await outlineWith(c.request, draft.body);
      out.push({
        label: c.label,
        source: c.source,
        current,
        draft: next,
        differences: differences(current, next),
      });
    }
    return {
      draft: { id: draft.ref.id, version: draft.ref.version },
      against: { id: against.ref.id, version: against.ref.version },
      cases: out,
    };
  }
}

async function outlineWith(request: PlanRequest, rules: RuleSetDocument): Promise<PlanOutline> {
  try {
    return outline(await engine.generatePlan(request, rules));
  } catch (error) {
    return { phases: [], warnings: [], cautions: [], error: (error as Error)?.message ?? String(error) };
  }
}

/** What a head of coaching compares: per phase the minutes, group sizes and areas; the notices. */
export function outline(plan: Plan): PlanOutline {
  return {
    phases: plan.phases.map((p) => ({
      name: p.name,
      minutes: p.endMinute - p.startMinute,
      groups: p.stations.map((s) => s.playerIds.length + s.coachJoins),
      areas: [...new Set(p.stations.map((s) => `${s.area.width} × ${s.area.length} m`))],
    })),
    warnings: plan.warnings.map((w) => w.message),
    cautions: plan.cautions.map((c) => c.message),
  };
}

/**
 * Plain-words differences between two outlines, each line a whole message ("before → after"),
 * so a translation can word it its own way.
 */
export function differences(a: PlanOutline, b: PlanOutline): string[] {
  const out: string[] = [];
  if (a.error || b.error) {
    if (a.error !== b.error) {
      const made = $localize`:the plan was made without an error, in a rule preview line:made`;
      const before = a.error ?? made;
      const after = b.error ?? made;
      out.push(
        $localize`:a rule preview line, the current rules' plan then the draft's:plan: ${before}:before: → ${after}:after:`,
      );
    }
    return out;
  }
  if (a.phases.length !== b.phases.length) {
    const before = a.phases.length;
    const after = b.phases.length;
    out.push($localize`:a rule preview line, how many phases:phases: ${before}:before: → ${after}:after:`);
  }
  const n = Math.max(a.phases.length, b.phases.length);
  for (let i = 0; i < n; i++) {
    const x = a.phases[i];
    const y = b.phases[i];
    const number = i + 1;
    if (!x || !y) {
      out.push(
        x
          ? $localize`:a rule preview line:phase ${number}:number: (${x.name}:phaseName:) dropped`
          : $localize`:a rule preview line:phase ${number}:number: (${y!.name}:phaseName:) added`,
      );
      continue;
    }
    const label = x.name === y.name ? x.name : `${x.name} → ${y.name}`;
    if (x.name !== y.name)
      out.push(
        $localize`:a rule preview line, a renamed phase:phase ${number}:number:: ${label}:phaseNames:`,
      );
    if (x.minutes !== y.minutes) {
      const before = x.minutes;
      const after = y.minutes;
      out.push(
        $localize`:a rule preview line, a phase's minutes:${label}:phase:: ${before}:before: → ${after}:after: min`,
      );
    }
    if (x.groups.join() !== y.groups.join()) {
      const before = x.groups.join(', ');
      const after = y.groups.join(', ');
      out.push(
        $localize`:a rule preview line, a phase's group sizes:${label}:phase:: groups ${before}:before: → ${after}:after:`,
      );
    }
    if (x.areas.join() !== y.areas.join()) {
      const before = x.areas.join(', ');
      const after = y.areas.join(', ');
      out.push(
        $localize`:a rule preview line, a phase's areas:${label}:phase:: area ${before}:before: → ${after}:after:`,
      );
    }
  }
  for (const w of b.warnings.filter((w) => !a.warnings.includes(w)))
    out.push($localize`:a rule preview line:new warning: ${w}:warning:`);
  for (const w of a.warnings.filter((w) => !b.warnings.includes(w)))
    out.push($localize`:a rule preview line:warning gone: ${w}:warning:`);
  for (const c of b.cautions.filter((c) => !a.cautions.includes(c)))
    out.push($localize`:a rule preview line:new caution: ${c}:caution:`);
  for (const c of a.cautions.filter((c) => !b.cautions.includes(c)))
    out.push($localize`:a rule preview line:caution gone: ${c}:caution:`);
  return out;
}
