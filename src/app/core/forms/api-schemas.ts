/**
 * Where each form finds the server's JSON Schema for its request body (shared/schemas/api).
 * Loaded lazily so the schemas stay out of the initial bundle.
 */
export type SchemaName =
  | 'auth-login'
  | 'auth-me-update'
  | 'auth-register'
  | 'invitation-accept'
  | 'team-create'
  | 'team-update'
  | 'player-create'
  | 'player-update'
  | 'kit-bag'
  | 'plan-request'
  | 'plan-create'
  | 'plan-share'
  | 'scheduled-session'
  | 'weekly-sessions';

type Json = { default: object };

const loaders: Partial<Record<SchemaName, () => Promise<Json>>> = {
  'auth-login': () => import('../../../../shared/schemas/api/auth-login.schema.json'),
  'auth-me-update': () => import('../../../../shared/schemas/api/auth-me-update.schema.json'),
  'auth-register': () => import('../../../../shared/schemas/api/auth-register.schema.json'),
  'invitation-accept': () => import('../../../../shared/schemas/api/invitation-accept.schema.json'),
  'team-create': () => import('../../../../shared/schemas/api/team-create.schema.json'),
  'team-update': () => import('../../../../shared/schemas/api/team-update.schema.json'),
  'player-create': () => import('../../../../shared/schemas/api/player-create.schema.json'),
  'player-update': () => import('../../../../shared/schemas/api/player-update.schema.json'),
  'kit-bag': () => import('../../../../shared/schemas/api/kit-bag.schema.json'),
  'plan-create': () => import('../../../../shared/schemas/api/plan-create.schema.json'),
  'plan-share': () => import('../../../../shared/schemas/api/plan-share.schema.json'),
  'plan-request': () => import('../../../../shared/schemas/plan-request.schema.json'),
  'scheduled-session': () => import('../../../../shared/schemas/api/scheduled-session.schema.json'),
  'weekly-sessions': () => import('../../../../shared/schemas/api/weekly-sessions.schema.json'),
};

/** The schema for a request body, or null when the API has none for it yet. */
export async function loadApiSchema(name: SchemaName): Promise<object | null> {
  const load = loaders[name];
  return load ? (await load()).default : null;
}
