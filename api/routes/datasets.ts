// Uploaded radial data: /api/projects/:projectId/datasets (list, upload a CSV) and
// /api/datasets/:datasetId (read with the points, delete).
import { Router } from 'express';
import type { Knex } from 'knex';
import { z } from 'zod';
import { MAX_DATASET_FILE_BYTES, uploadDatasetFields } from '../../shared/api/datasets';
import { idParam } from '../../shared/api/schemas';
import { AppError } from '../lib/app-error';
import { mayEditProject } from '../middleware/may-edit-project';
import { currentUser, requireUser } from '../middleware/require-user';
import { singleFileUpload } from '../middleware/upload';
import { validated } from '../middleware/validate';
import { listDatasets } from '../repositories/datasets';
import { authoriseDataset, removeDataset, uploadDataset } from '../services/datasets';
import { authoriseProject } from '../services/project-access';

const projectParams = z.object({ projectId: idParam });
const datasetParams = z.object({ datasetId: idParam });

export function projectDatasetRoutes(db: Knex): Router {
  const r = Router();
  r.use(requireUser);

  r.get(
    '/:projectId/datasets',
    validated({ params: projectParams }, async ({ params }, req, res) => {
      await authoriseProject(db, currentUser(req), params.projectId, 'read');
      res.json(await listDatasets(db, params.projectId));
    }),
  );

  r.post(
    '/:projectId/datasets',
    mayEditProject(db),
    singleFileUpload('file', MAX_DATASET_FILE_BYTES, 'CSV file'),
    validated(
      { params: projectParams, body: uploadDatasetFields },
      async ({ params, body }, req, res) => {
        const user = currentUser(req);
        await authoriseProject(db, user, params.projectId, 'edit');
        if (!req.file)
          throw new AppError(400, 'invalid_upload', 'choose a CSV file', {
            file: 'choose a CSV file',
          });
        res
          .status(201)
          .json(await uploadDataset(db, user, params.projectId, body, req.file.buffer));
      },
    ),
  );
  return r;
}

export function datasetRoutes(db: Knex): Router {
  const r = Router();
  r.use(requireUser);

  r.get(
    '/:datasetId',
    validated({ params: datasetParams }, async ({ params }, req, res) => {
      res.json(await authoriseDataset(db, currentUser(req), params.datasetId, 'read'));
    }),
  );

  r.delete(
    '/:datasetId',
    validated({ params: datasetParams }, async ({ params }, req, res) => {
      const user = currentUser(req);
      await removeDataset(db, user, await authoriseDataset(db, user, params.datasetId, 'edit'));
      res.status(204).end();
    }),
  );
  return r;
}
