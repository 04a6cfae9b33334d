/**
 * `npm run build`: the production client build (`ng build`), then a brotli and a gzip copy of
 * every text file beside it, which the server sends to browsers that accept them.
 */
import { buildClient } from '../client-build';

process.exit(buildClient() ? 0 : 1);
