// Checks the caller may change the project in :projectId before an upload is read, so people
// outside it never get to send a file (404 for non-members, 403 for readers, as everywhere).
import type { RequestHandler } from 'express';
import type { Knex } from 'knex';
import { idParam } from '../../shared/api/schemas';
import { notFound } from '../lib/app-error';
import { authoriseProject } from '../services/project-access';
import { currentUser } from './require-user';

export function mayEditProject(db: Knex): RequestHandler {
  return async (req, _res, next) => {
    const id = idParam.safeParse(req.params.projectId);
    if (!id.success) return next(notFound('project'));
    try {
      await authoriseProject(db, currentUser(req), id.data, 'edit');
      next();
    } catch (err) {
      next(err);
    }
  };
}
