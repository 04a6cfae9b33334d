/**
 * Children per adult against the club's ratios, a helpful warning when the adults are too few
 * (or none), and how many stations can run at once: `stationsPerAdult` for each adult present.
 */
import type { Notice, PlanRequest, RuleParameters, Supervision } from '../../shared/types';

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
        message: `No adult entered for ${children} ${children === 1 ? 'child' : 'children'}. A session needs someone in charge, and the usual guidance is at least ${recommended} adults here (1 adult for every ${ratio.childrenPerAdult} at ${request.ageGroup}, never fewer than ${s.minAdults}).`,
        source: s.source,
      });
    } else if (adults < recommended) {
      const more = recommended - adults;
      warnings.push({
        code: 'supervision-ratio',
        message: `${children} ${children === 1 ? 'child' : 'children'} at ${request.ageGroup} with ${adults} adult${adults === 1 ? '' : 's'}: the usual guidance is at least ${recommended} (1 for every ${ratio.childrenPerAdult}, never fewer than ${s.minAdults}). Ask ${more} parent${more === 1 ? '' : 's'} or helper${more === 1 ? '' : 's'} to stay: one can run a station, one can look after drinks, kit and anyone who gets hurt.`,
        source: s.source,
      });
    }
  } else if (adults === 0) {
    warnings.push({
      code: 'no-adult',
      message:
        'No coach entered: the plan assumes one person runs it, with at most ' +
        s.stationsPerAdult +
        ' stations at once.',
    });
  }
  return { supervision, warnings };
}
