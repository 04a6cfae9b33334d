/**
 * Children per adult against the club's ratios, a helpful warning when the adults are too few
 * (or none), and how many stations can run at once: `stationsPerAdult` for each adult present.
 */
import '../../shared/i18n/localize';
import type { Notice, PlanRequest, RuleParameters, Supervision } from '../../shared/types';
import { ageInSentence } from './activities';

export function superviseRequest(
  request: PlanRequest,
  params: RuleParameters,
): { supervision: Supervision; warnings: Notice[] } {
  const s = params.supervision;
  const age = params.ageGroups[request.ageGroup].index;
  const children = request.players.length;
  const adults = request.coaches;
  const supervision: Supervision = {
    children,
    adults,
    maxStations: s.stationsPerAdult * Math.max(1, adults),
  };
  const warnings: Notice[] = [];
  const ratio = request.ageGroup === 'adult' ? undefined : s.ratios.find((r) => age <= r.upToAge);
  if (ratio) {
    const recommended = Math.max(s.minAdults, Math.ceil(children / ratio.childrenPerAdult));
    supervision.recommendedAdults = recommended;
    supervision.ratio = `1:${ratio.childrenPerAdult}`;
    supervision.source = s.source;
    if (adults === 0) {
      warnings.push({
        code: 'no-adult',
        message: $localize`No adult entered for ${childrenInWords(children)}:children:. A session needs someone in charge, and the usual guidance is at least ${recommended}:recommended: adults here (1 adult for every ${ratio.childrenPerAdult}:childrenPerAdult: at ${ageInSentence(request.ageGroup)}:ageGroup:, never fewer than ${s.minAdults}:minAdults:).`,
        source: s.source,
      });
    } else if (adults < recommended) {
      const more = recommended - adults;
      const who = childrenInWords(children);
      const age = ageInSentence(request.ageGroup);
      const present = adultsInWords(adults);
      const per = ratio.childrenPerAdult;
      warnings.push({
        code: 'supervision-ratio',
        message:
          more === 1
            ? $localize`${who}:children: at ${age}:ageGroup: with ${present}:adults:: the usual guidance is at least ${recommended}:recommended: (1 for every ${per}:childrenPerAdult:, never fewer than ${s.minAdults}:minAdults:). Ask 1 parent or helper to stay: one can run a station, one can look after drinks, kit and anyone who gets hurt.`
            : $localize`${who}:children: at ${age}:ageGroup: with ${present}:adults:: the usual guidance is at least ${recommended}:recommended: (1 for every ${per}:childrenPerAdult:, never fewer than ${s.minAdults}:minAdults:). Ask ${more}:more: parents or helpers to stay: one can run a station, one can look after drinks, kit and anyone who gets hurt.`,
        source: s.source,
      });
    }
  } else if (adults === 0) {
    warnings.push({
      code: 'no-adult',
      message: $localize`No coach entered: the plan assumes one person runs it, with at most ${s.stationsPerAdult}:stations: stations at once.`,
    });
  }
  return { supervision, warnings };
}

/** "1 child", "12 children". */
function childrenInWords(n: number): string {
  return n === 1 ? $localize`1 child` : $localize`${n}:count: children`;
}

/** Adults inside a sentence: "no adults", "1 adult", "3 adults". */
export function adultsInWords(n: number): string {
  if (n === 0) return $localize`:how many adults, inside a sentence:no adults`;
  return n === 1
    ? $localize`:how many adults, inside a sentence:1 adult`
    : $localize`:how many adults, inside a sentence:${n}:count: adults`;
}
