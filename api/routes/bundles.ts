// Lobewright bundles and figure copies: GET …/bundle downloads, POST /api/projects/import (new
// project), POST /api/projects/:projectId/import (into a project), POST /api/figures/:figureId/copy.
import { Router, type Response } from 'express';
import type { Knex } from 'knex';
import { z } from 'zod';
import { copyFigureBody, MAX_BUNDLE_BYTES, type LobewrightBundle } from '../../shared/api/bundle';
import { idParam } from '../../shared/api/schemas';
import { AppError } from '../lib/app-error';
import { mayEditProject } from '../middleware/may-edit-project';
import { currentUser, requireUser } from '../middleware/require-user';
import { singleFileUpload } from '../middleware/upload';
import { validated } from '../middleware/validate';
import { exportFigureBundle, exportProjectBundle, importBundle } from '../services/bundles';
import { copyFigure } from '../services/copy-figure';
import { authoriseFigure, authoriseProject } from '../services/project-access';

const projectParams = z.object({ projectId: idParam });
const figureParams = z.object({ figureId: idParam });
const uploadBundle = singleFileUpload('bundle', MAX_BUNDLE_BYTES, 'bundle file');

function sendBundle(res: Response, bundle: LobewrightBundle, stem: string): void {
  const safe =
    stem
      .replace(/[^0-9A-Za-z.]+/g, '-')
      .replace(/^-|-$/g, '')
      .slice(0, 60) || 'bundle';
  res
    .type('application/json')
    .set('Content-Disposition', `attachment; filename="${safe}.lobewright.json"`)
    .send(JSON.stringify(bundle, null, 2) + '\n');
}

function uploadedBytes(req: { file?: Express.Multer.File }): Buffer {
  if (!req.file)
    throw new AppError(400, 'invalid_upload', 'choose a bundle file to upload', {
      bundle: 'choose a bundle file to upload',
    });
  return req.file.buffer;
}

export function projectBundleRoutes(db: Knex): Router {
  const r = Router();
  r.use(requireUser);

  r.post(
    '/import',
    uploadBundle,
    validated({}, async (_input, req, res) => {
      res
        .status(201)
        .json(await importBundle(db, currentUser(req), uploadedBytes(req), 'new project'));
    }),
  );

  r.get(
    '/:projectId/bundle',
    validated({ params: projectParams }, async ({ params }, req, res) => {
      await authoriseProject(db, currentUser(req), params.projectId, 'read');
      const bundle = await exportProjectBundle(db, params.projectId);
      sendBundle(res, bundle, bundle.project.name);
    }),
  );

  r.post(
    '/:projectId/import',
    mayEditProject(db),
    uploadBundle,
    validated({ params: projectParams }, async ({ params }, req, res) => {
      const user = currentUser(req);
      await authoriseProject(db, user, params.projectId, 'edit');
      res.json(await importBundle(db, user, uploadedBytes(req), { projectId: params.projectId }));
    }),
  );
  return r;
}

export function figureBundleRoutes(db: Knex): Router {
  const r = Router();
  r.use(requireUser);

  r.get(
    '/:figureId/bundle',
    validated({ params: figureParams }, async ({ params }, req, res) => {
      const { projectId } = await authoriseFigure(db, currentUser(req), params.figureId, 'read');
      const bundle = await exportFigureBundle(db, projectId, params.figureId);
      const f = bundle.figures[0];
      sendBundle(res, bundle, `figure-${f.number || params.figureId}`);
    }),
  );

  r.post(
    '/:figureId/copy',
    validated(
      { params: figureParams, body: copyFigureBody },
      async ({ params, body }, req, res) => {
        const user = currentUser(req);
        await authoriseFigure(db, user, params.figureId, 'edit');
        await authoriseProject(db, user, body.projectId, 'edit');
        res.status(201).json(await copyFigure(db, user, params.figureId, body.projectId));
      },
    ),
  );
  return r;
}
