import '../../shared/i18n/localize';
import { Router } from 'express';
import { publicRateLimit } from '../middleware/rate-limit';
import { validate } from '../middleware/validate';
import { CalendarService, calendarFeed } from '../services/calendar-service';
import type { ApiDeps } from './api-deps';
import { scopeOf } from './scoped';

/**
 * /teams/:id/calendar: the address of a team's calendar feed (read; renew or turn off by its
 * schedulers); /calendar/<secret>.ics: the feed itself, public, for calendar apps without an account.
 * The request log shows the feed's path without its secret (see server/app.ts).
 */
export function calendarRouter({ dataSource, config, requireAuth }: ApiDeps): Router {
  const router = Router();
  const id = validate({ params: 'id-param' });
  const limiter = publicRateLimit(
    config,
    dataSource,
    'calendar',
    () => $localize`Too many calendar requests from here. Wait a few minutes.`,
  );
  const service = (req: Parameters<typeof scopeOf>[0]) => new CalendarService(scopeOf(req, dataSource));

  router.get('/teams/:id/calendar', requireAuth, id, async (req, res) => {
    res.json(await service(req).get(req.params['id'] as string));
  });
  router.post('/teams/:id/calendar', requireAuth, id, async (req, res) => {
    res.status(201).json(await service(req).renew(req.params['id'] as string));
  });
  router.delete('/teams/:id/calendar', requireAuth, id, async (req, res) => {
    await service(req).revoke(req.params['id'] as string);
    res.status(204).end();
  });

  router.get('/calendar/:file', limiter, validate({ params: 'calendar-param' }), async (req, res) => {
    const token = (req.params['file'] as string).replace(/\.ics$/, '');
    const text = await calendarFeed(dataSource.manager, token, config.publicUrl, config.locale);
    res
      .type('text/calendar; charset=utf-8')
      // Not the API's no-store: calendar apps poll the feed, and it names no player.
      .setHeader('Cache-Control', 'private, max-age=300')
      .setHeader('X-Robots-Tag', 'noindex')
      .send(text);
  });
  return router;
}
