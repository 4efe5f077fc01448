import { Router } from 'express';
import type { Example } from '../examples';
import { AppError } from '../http/app-error';

/** GET /api/examples and /api/examples/:id: the shipped demo and example scenario files, read-only. */
export function examplesRouter(examples: Example[]): Router {
  const router = Router();
  router.get('/', (_req, res) => {
    res.json({ examples: examples.map(({ id, title }) => ({ id, title })) });
  });
  router.get('/:id', (req, res) => {
    const found = examples.find((e) => e.id === req.params.id);
    if (!found) throw new AppError('not_found', `There is no example "${req.params.id}".`);
    res.json(found);
  });
  return router;
}
