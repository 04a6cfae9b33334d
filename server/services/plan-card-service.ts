import '../../shared/i18n/localize';
import type { ShareResultDto } from '../../shared/types/plan-api';
import type { AppConfig } from '../config';
import { planLength, sessionClock } from '../../shared/time/session-clock';
import { renderCard } from '../pdf/card-pool';
import type { Paper } from '../pdf';
import type { SessionPlan } from '../entities/session-plan';
import type { Team } from '../entities/team';
import { refuseOverDailyLimit } from './daily-mail-limit';
import type { ClubScope } from './club-scope';
import { rulesInWords } from '../../shared/types/rule-words';
import { HelperLinkService } from './helper-link-service';
import type { MailQueue } from './mail-queue';
import { RuleSetService } from './rule-set-service';
import { localeOf } from './account-service';
import type { Units } from '../../shared/units';
import { minuteInWords, sessionInWords } from './session-day';

export interface SharePlanInput {
  recipients: string[];
  message?: string;
  paper?: Paper;
}

/** The printed card of a stored plan: download it, or e-mail it through the outbox. */
export class PlanCardService {
  constructor(
    private readonly scope: ClubScope,
    private readonly mail: MailQueue,
    private readonly config: AppConfig,
  ) {}

  async pdf(planId: string, paper: Paper): Promise<{ pdf: Buffer; filename: string }> {
    const { manager, auth } = this.scope;
    const row = await this.scope.plan(planId);
    const team = await this.scope.teamToRead(row.teamId);
    const locale = await localeOf(manager, auth.userId, this.config.locale);
    const rules = await this.rulesWords(row, locale);
    return {
      pdf: await render(row, team, paper, locale, auth.units, rules),
      filename: cardFilename(row, team),
    };
  }

  /**
   * Queues one message per recipient (so parents do not see each other's addresses) with the card
   * attached and one helper link for them all, unless the session is too long ago for one. From
   * stays the club's sending address (mail from the coach's own domain sent by this server would
   * fail that domain's SPF/DKIM checks and be junked or refused); Reply-To is the coach.
   */
  async share(planId: string, input: SharePlanInput): Promise<ShareResultDto> {
    const { manager, auth } = this.scope;
    const row = await this.scope.plan(planId);
    const team = await this.scope.teamToManage(row.teamId);
    // The card and the e-mail read in the sender's locale (their browser's), else the club's.
    const locale = await localeOf(manager, auth.userId, this.config.locale);
    const rules = await this.rulesWords(row, locale);
    const pdf = await render(row, team, input.paper ?? 'a4', locale, auth.units, rules);
    const when = sessionInWords(row.date, row.kickOff, locale);
    const subject = shareSubject(row, team, when);
    const attachment = {
      filename: cardFilename(row, team),
      contentType: 'application/pdf',
      contentBase64: pdf.toString('base64'),
    };
    const expiresAt = await new HelperLinkService(this.scope, this.config).expiryFor(row);
    const messageIds = await this.scope.transaction(async (scope) => {
      await refuseOverDailyLimit(
        scope.manager,
        auth.clubId,
        'plan-share',
        input.recipients.length,
        this.config.dailyMailLimits.shares,
      );
      const helperLinks = new HelperLinkService(scope, this.config);
      const helper = expiresAt
        ? {
            url: (await helperLinks.issue(row, input.recipients.length)).url,
            until: await helperLinks.expiryWords(expiresAt, locale),
          }
        : null;
      const text = shareText(row, team, auth.name, when, helper, locale, input.message);
      const ids: string[] = [];
      for (const recipient of input.recipients) {
        ids.push(
          await this.mail.enqueue(scope.manager, {
            clubId: auth.clubId,
            kind: 'plan-share',
            recipients: [recipient],
            replyTo: { name: auth.name, address: auth.email },
            subject,
            text,
            attachments: [attachment],
          }),
        );
      }
      return ids;
    });
    return { queued: messageIds.length, messageIds };
  }

  /** "Club rules: Fernmoor rules, published 3 Dec" for the card's footer ("Club rules" if they are gone). */
  private async rulesWords(row: SessionPlan, locale: string): Promise<string> {
    const summary = await new RuleSetService(this.scope).summary(row.ruleSetId).catch(() => null);
    return rulesInWords(summary, locale);
  }
}

async function render(
  row: SessionPlan,
  team: Team,
  paper: Paper,
  locale: string,
  units: Units,
  rules: string,
): Promise<Buffer> {
  return renderCard(
    { plan: row.plan, teamName: team.name, date: row.date, kickOff: row.kickOff, locale, units, rules },
    paper,
  );
}

/** "U12 Larks: training session on Saturday 5 December at 10:00". */
function shareSubject(row: SessionPlan, team: Team, when: string | null): string {
  const teamName = team.name;
  if (row.kind === 'match-warm-up')
    return when
      ? $localize`:subject of the e-mail that shares a plan:${teamName}:teamName:: match warm-up on ${when}:when:`
      : $localize`:subject of the e-mail that shares a plan:${teamName}:teamName:: match warm-up`;
  return when
    ? $localize`:subject of the e-mail that shares a plan:${teamName}:teamName:: training session on ${when}:when:`
    : $localize`:subject of the e-mail that shares a plan:${teamName}:teamName:: training session`;
}

/** "Sam Reed shared the training session for U12 Larks on Saturday 5 December at 10:00 with you." */
function sharedLine(row: SessionPlan, team: Team, sender: string, when: string | null): string {
  const teamName = team.name;
  if (row.kind === 'match-warm-up')
    return when
      ? $localize`:first line of the e-mail that shares a plan:${sender}:sender: shared the match warm-up for ${teamName}:teamName: on ${when}:when: with you.`
      : $localize`:first line of the e-mail that shares a plan:${sender}:sender: shared the match warm-up for ${teamName}:teamName: with you.`;
  return when
    ? $localize`:first line of the e-mail that shares a plan:${sender}:sender: shared the training session for ${teamName}:teamName: on ${when}:when: with you.`
    : $localize`:first line of the e-mail that shares a plan:${sender}:sender: shared the training session for ${teamName}:teamName: with you.`;
}

/** The card's file name, as downloaded and as attached to an e-mail. */
export function cardFilename(row: Pick<SessionPlan, 'date'>, team: Pick<Team, 'name'>): string {
  const slug =
    team.name
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, '-')
      .replace(/^-|-$/g, '') || 'team';
  return `${slug}-${row.date ?? 'plan'}-card.pdf`;
}

function shareText(
  row: SessionPlan,
  team: Team,
  sender: string,
  when: string | null,
  helper: { url: string; until: string } | null,
  locale: string,
  message?: string,
): string {
  const clock = sessionClock(row.plan.request.kind, row.kickOff, planLength(row.plan.phases));
  const at = (minute: number) => minuteInWords(clock, minute, locale);
  const lines = row.plan.phases.map((p) => `${at(p.startMinute)}–${at(p.endMinute)}  ${p.name}`);
  const minutes = planLength(row.plan.phases);
  const players = row.playerCount;
  return [
    sharedLine(row, team, sender, when),
    message ? `\n${message}\n` : '',
    ...(helper
      ? [
          $localize`:e-mail that shares a plan, before the helper link:See the plan on your phone, no account needed:`,
          helper.url,
          $localize`:e-mail that shares a plan, after the helper link:The link shows the stations, the groups (first names only), the areas, diagrams, coaching points and timings. It stops working at ${helper.until}:until:, or sooner if the coach stops it. Please keep it to yourself.`,
          '',
        ]
      : []),
    players === 1
      ? $localize`:e-mail that shares a plan, before its list of phases:${minutes}:minutes: minutes, 1 player:`
      : $localize`:e-mail that shares a plan, before its list of phases:${minutes}:minutes: minutes, ${players}:players: players:`,
    ...lines,
    '',
    $localize`:e-mail that shares a plan:The printable card is attached (PDF).`,
    $localize`:e-mail that shares a plan:To answer ${sender}:sender:, reply to this e-mail.`,
    $localize`:safety note at the end of the e-mail that shares a plan:Anchor or weight movable goals and never let anyone climb them; follow your local rules and the club safeguarding policy.`,
  ]
    .filter((l, i, all) => l !== '' || (i > 0 && all[i - 1] !== ''))
    .join('\n');
}
