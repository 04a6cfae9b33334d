/** API shapes of helper links: a read-only view of one plan for a parent helper without an account. */
import type { Notice, Phase } from './plan';
import type { PlanKind } from './plan-request';
import type { Units } from '../units';

/** A live helper link as the team's staff see it (the token itself is never stored). */
export interface HelperLinkDto {
  id: string;
  planId: string;
  createdAt: string;
  /** When the link stops working. */
  expiresAt: string;
  /** Who made it, or null when they have left the club. */
  createdByName: string | null;
  /** How many people it was e-mailed to with the plan (0 when made to copy). */
  emailedTo: number;
}

/** Answer of POST /api/plans/:id/helper-links: the only time the link's address is shown. */
export interface CreatedHelperLinkDto extends HelperLinkDto {
  /** The address to hand on; its token is in the fragment (after #), so no server ever logs it. */
  url: string;
}

/**
 * Answer of GET /api/helper-view: what a helper needs on the pitch and nothing more. Player ids
 * are replaced by stand-ins (`h1`, `h2` …) and names are first names only.
 */
export interface HelperViewDto {
  teamName: string;
  kind: PlanKind;
  /** YYYY-MM-DD, if the plan has a date. */
  date: string | null;
  /** HH:MM, if given. */
  kickOff: string | null;
  minutes: number;
  playerCount: number;
  phases: Phase[];
  /** Safety cautions of the plan. */
  cautions: Notice[];
  /** First name by stand-in id; a repeated first name gets a number ("Sam", "Sam 2"). */
  names: Record<string, string>;
  expiresAt: string;
  /**
   * The units the helper reads sizes and temperatures in: those of the coach who made the link,
   * or the club's once they have left. The plan itself stays metric, as everywhere.
   */
  units: Units;
}

/** The request header that carries a helper link's token to GET /api/helper-view. */
export const HELPER_TOKEN_HEADER = 'Helper-Token';
