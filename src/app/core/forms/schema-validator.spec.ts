import { loadApiSchema, SchemaName } from './api-schemas';
import { schemaCheck } from './schema-validator';

// Record<SchemaName, …> so a new form schema without a precompiled validator fails here.
const EVERY_SCHEMA: Record<SchemaName, true> = {
  'auth-login': true,
  'auth-me-update': true,
  'auth-register': true,
  'invitation-accept': true,
  'team-create': true,
  'team-update': true,
  'player-create': true,
  'player-update': true,
  'kit-bag': true,
  'plan-request': true,
  'plan-create': true,
  'plan-share': true,
  'scheduled-session': true,
  'weekly-sessions': true,
};

describe('schemaCheck', () => {
  for (const name of Object.keys(EVERY_SCHEMA) as SchemaName[]) {
    it(`has a precompiled validator for ${name}`, async () => {
      const schema = await loadApiSchema(name);
      expect(schema).not.toBeNull();
      const check = await schemaCheck(schema!);
      expect(Object.keys(check({})).length).toBeGreaterThan(0);
    });
  }

  it('names each bad field in plain words, formats and shared definitions included', async () => {
    const check = await schemaCheck((await loadApiSchema('auth-register'))!, { email: 'E-mail' });
    const errors = check({
      email: 'not-an-address',
      password: 'x',
      name: 'Ada Example',
      clubName: 'Invented FC',
    });
    expect(errors['email']).toBe('E-mail must be an e-mail address like name@example.org.');
    expect(errors['password']).toContain('at least');
    const login = await schemaCheck((await loadApiSchema('auth-login'))!);
    expect(login({ email: 'coach@example.org', password: 'long enough secret' })).toEqual({});
  });

  it('rejects a schema it has no precompiled validator for, naming its $id', async () => {
    await expect(schemaCheck({ $id: 'unknown.schema.json', type: 'object' })).rejects.toThrow(
      /unknown\.schema\.json/,
    );
  });
});
