/**
 * The stack the browser benchmarks measure: the production client (built now, or the build that
 * is there with SKIP_CLIENT_BUILD=1, compressed as `npm run build` does), served with the demo club
 * by the e2e suite's throwaway set-up. Returns the app's address; `teardown` stops it all.
 */
import { precompressClient } from '../../../server/build/precompress';
import { buildClient } from '../../../server/client-build';
import { setup } from '../../support/e2e-global-setup';

export { teardown } from '../../support/e2e-global-setup';

export async function startBenchStack(): Promise<string> {
  if (process.env['SKIP_CLIENT_BUILD'] === '1') precompressClient();
  else if (!buildClient(() => undefined))
    throw new Error('The client build failed: run `npm run build` to see why.');
  process.env['SKIP_CLIENT_BUILD'] = '1';
  const provided = new Map<string, string>();
  await setup({ provide: (key: string, value: string) => provided.set(key, value) } as never);
  return provided.get('baseUrl')!;
}
