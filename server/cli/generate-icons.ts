/**
 * Writes the path data of the icons the app ships (src/app/core/icons/icon-names.ts) to
 * src/app/core/icons/generated/icon-svgs.ts. Run after adding or removing a name:
 *   npm run -s generate:icons
 * A spec (tests/tooling/icons.spec.ts) fails when the output is stale.
 */
import { mkdirSync, writeFileSync } from 'node:fs';
import { dirname } from 'node:path';
import { fileURLToPath } from 'node:url';
import { ICON_SVGS_PATH, iconNames, iconSource } from './icon-sources';

let source: string;
try {
  source = iconSource();
} catch (error) {
  console.error(`generate:icons: ${(error as Error).message}`);
  process.exit(1);
}
const target = fileURLToPath(new URL(`../../${ICON_SVGS_PATH}`, import.meta.url));
mkdirSync(dirname(target), { recursive: true });
writeFileSync(target, source);
console.log(`wrote ${ICON_SVGS_PATH} (${iconNames().length} icons)`);
