import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import { SearchQuery } from '@shared/schemas/course';
import { parseQuery } from '../../lib/validate';
import { requireAuth } from '../auth/guards';
import { catalogueOf } from './catalogue';
import { searchLessons } from './lesson-search';

/** Mounted at /api/search: ranked lessons with a snippet and the words that matched. */
export function searchRouter(sequelize: Sequelize) {
  const router = Router();
  router.get('/', requireAuth, (req, res) => {
    const { q } = parseQuery(SearchQuery, req);
    res.json({ query: q, results: searchLessons(catalogueOf(sequelize).search, q) });
  });
  return router;
}
