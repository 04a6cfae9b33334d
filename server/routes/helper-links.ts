import '../../shared/i18n/localize';
import { Router } from 'express';
import { HELPER_TOKEN_HEADER } from '../../shared/types/helper-view';
import { publicRateLimit } from '../middleware/rate-limit';
import { validate } from '../middleware/validate';
import { HelperLinkService, HelperViewService } from '../services/helper-link-service';
import type { ApiDeps } from './api-deps';
import { scopeOf } from './scoped';

/**
 * /plans/:id/helper-links: the team's staff make, list and stop read-only links for parent helpers.
 * /helper-view: the public read of a plan through such a link.
 */
export function helperLinksRouter({ dataSource, config, requireAuth }: ApiDeps): Router {
  const router = Router();
  const links = (req: Parameters<typeof scopeOf>[0]) =>
    new HelperLinkService(scopeOf(req, dataSource), config);
  const helperView = new HelperViewService(dataSource, config);
  const id = validate({ params: 'id-param' });
  const limiter = publicRateLimit(
    config,
    dataSource,
    'helper-view',
    () => $localize`Too many tries from here. Wait a few minutes and open the link again.`,
  );

  router.get('/helper-view', limiter, async (req, res) => {
    const view = await helperView.view(req.get(HELPER_TOKEN_HEADER));
    res.setHeader('Referrer-Policy', 'no-referrer').setHeader('X-Robots-Tag', 'noindex, nofollow').json(view);
  });
  router.post('/plans/:id/helper-links', requireAuth, id, async (req, res) => {
    res.status(201).json(await links(req).create(req.params['id'] as string));
  });
  router.get('/plans/:id/helper-links', requireAuth, id, async (req, res) => {
    res.json(await links(req).list(req.params['id'] as string));
  });
  router.delete('/plans/:id/helper-links/:linkId', requireAuth, id, async (req, res) => {
    await links(req).revoke(req.params['id'] as string, req.params['linkId'] as string);
    res.status(204).end();
  });
  return router;
}
