// Export runs: /api/projects/:projectId/exports (start, list) and /api/exports/:runId (progress, bundle).
import { Router } from 'express';
import type { Knex } from 'knex';
import { z } from 'zod';
import { createExportBody, idParam } from '../../shared/api/schemas';
import { AppError, notFound } from '../lib/app-error';
import { currentUser, requireUser } from '../middleware/require-user';
import { validated } from '../middleware/validate';
import { authoriseProject } from '../services/project-access';
import { recordAudit } from '../services/audit';
import { createExportRun, exportRunProject, findBundle, findExportRun, listExportRuns } from '../services/exports';

const projectParams = z.object({ projectId: idParam });
const runParams = z.object({ runId: idParam });

export function projectExportRoutes(db: Knex, enqueue: ((runId: number) => Promise<string | null>) | null): Router {
  const r = Router({ mergeParams: true });
  r.use(requireUser);
  r.get(
    '/:projectId/exports',
    validated({ params: projectParams }, async ({ params }, req, res) => {
      await authoriseProject(db, currentUser(req), params.projectId, 'read');
      res.json(await listExportRuns(db, params.projectId));
    }),
  );
  r.post(
    '/:projectId/exports',
    validated({ params: projectParams, body: createExportBody }, async ({ params, body }, req, res) => {
      const user = currentUser(req);
      await authoriseProject(db, user, params.projectId, 'read');
      if (!enqueue) throw new AppError(503, 'exports_unavailable', 'exports are not available on this server');
      const run = await createExportRun(db, user, params.projectId, body, enqueue);
      await recordAudit(db, { projectId: params.projectId, actorId: user.id, action: 'export.started', summary: `started export run ${run.id} (${run.selection}; ${run.formats.join(', ')})` });
      res.status(202).json(run);
    }),
  );
  return r;
}

export function exportRoutes(db: Knex): Router {
  const r = Router();
  r.use(requireUser);
  r.get(
    '/:runId',
    validated({ params: runParams }, async ({ params }, req, res) => {
      await authoriseProject(db, currentUser(req), await exportRunProject(db, params.runId), 'read');
      res.json(await findExportRun(db, params.runId));
    }),
  );
  r.get(
    '/:runId/bundle',
    validated({ params: runParams }, async ({ params }, req, res) => {
      await authoriseProject(db, currentUser(req), await exportRunProject(db, params.runId), 'read');
      const bundle = await findBundle(db, params.runId);
      if (!bundle) throw notFound('bundle (the run has not finished, or it failed)');
      res.set({ 'Content-Type': 'application/zip', 'Content-Disposition': `attachment; filename="${bundle.filename}"` });
      res.send(bundle.bytes);
    }),
  );
  return r;
}
