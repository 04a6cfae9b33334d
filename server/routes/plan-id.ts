import type { Request } from 'express';

/** The plan id of a `/plans/:id/…` path (checked by the `id-param` schema before the handler runs). */
export function planIdOf(req: Request): string {
  return req.params['id'] as string;
}
