// /api/figures/:figureId: one figure, its revisions, and saving a new revision.
import { Router } from 'express';
import type { Knex } from 'knex';
import { z } from 'zod';
import { idParam, updateFigureBody } from '../../shared/api/schemas';
import { notFound } from '../lib/app-error';
import { currentUser, requireUser } from '../middleware/require-user';
import { validated } from '../middleware/validate';
import { findFigure, findRevision, listRevisions } from '../repositories/figures';
import { deleteFigure, duplicateFigure, updateFigure } from '../services/figures';
import { renderFormats } from '../render/render-figure';
import { renderStoredFigure } from '../services/render-service';
import { authoriseFigure } from '../services/project-access';
import { recordAudit } from '../services/audit';

const figureParams = z.object({ figureId: idParam });
const revisionParams = z.object({ figureId: idParam, revision: idParam });
const renderQuery = z.object({
  format: z.enum(renderFormats),
  revision: idParam.optional(),
  cmyk: z.enum(['true', 'false']).default('false').transform((v) => v === 'true'),
  download: z.enum(['true', 'false']).default('false').transform((v) => v === 'true'),
});

export function figureRoutes(db: Knex): Router {
  const r = Router();
  r.use(requireUser);

  r.get(
    '/:figureId',
    validated({ params: figureParams }, async ({ params }, req, res) => {
      await authoriseFigure(db, currentUser(req), params.figureId, 'read');
      res.json(await findFigure(db, params.figureId));
    }),
  );

  r.put(
    '/:figureId',
    validated({ params: figureParams, body: updateFigureBody }, async ({ params, body }, req, res) => {
      const user = currentUser(req);
      const { projectId } = await authoriseFigure(db, user, params.figureId, 'edit');
      const figure = await updateFigure(db, user, params.figureId, body);
      await recordAudit(db, { projectId, actorId: user.id, action: 'figure.saved', summary: `saved figure ${figure.number || `#${figure.id}`} as revision ${figure.revision}` });
      res.json(figure);
    }),
  );

  r.post(
    '/:figureId/duplicate',
    validated({ params: figureParams }, async ({ params }, req, res) => {
      const user = currentUser(req);
      await authoriseFigure(db, user, params.figureId, 'edit');
      res.status(201).json(await duplicateFigure(db, user, params.figureId));
    }),
  );

  r.delete(
    '/:figureId',
    validated({ params: figureParams }, async ({ params }, req, res) => {
      const { projectId } = await authoriseFigure(db, currentUser(req), params.figureId, 'edit');
      const gone = await findFigure(db, params.figureId);
      await deleteFigure(db, params.figureId);
      await recordAudit(db, { projectId, actorId: currentUser(req).id, action: 'figure.deleted', summary: `deleted figure ${gone?.number || `#${params.figureId}`} "${gone?.title}"` });
      res.status(204).end();
    }),
  );

  r.get(
    '/:figureId/render',
    validated({ params: figureParams, query: renderQuery }, async ({ params, query }, req, res) => {
      await authoriseFigure(db, currentUser(req), params.figureId, 'read');
      const file = await renderStoredFigure(db, params.figureId, query.revision, query.format, query.cmyk);
      res.set({
        'Content-Type': file.contentType,
        'Content-Disposition': `${query.download ? 'attachment' : 'inline'}; filename="${file.filename}"`,
        ETag: `"${file.key}"`,
        'Cache-Control': 'private, max-age=0, must-revalidate',
        // Cautions travel with the file (ASCII-safe JSON), for clients that show them.
        'X-Lobewright-Notes': encodeURIComponent(JSON.stringify(file.notes)),
        'X-Lobewright-Cache': file.fromCache ? 'hit' : 'miss',
      });
      if (req.get('if-none-match') === `"${file.key}"`) {
        res.status(304).end();
        return;
      }
      res.send(file.bytes);
    }),
  );

  r.get(
    '/:figureId/revisions',
    validated({ params: figureParams }, async ({ params }, req, res) => {
      await authoriseFigure(db, currentUser(req), params.figureId, 'read');
      res.json(await listRevisions(db, params.figureId));
    }),
  );

  r.get(
    '/:figureId/revisions/:revision',
    validated({ params: revisionParams }, async ({ params }, req, res) => {
      await authoriseFigure(db, currentUser(req), params.figureId, 'read');
      const rev = await findRevision(db, params.figureId, params.revision);
      if (!rev) throw notFound('revision');
      res.json(rev);
    }),
  );
  return r;
}
