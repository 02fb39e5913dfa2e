// /api/figures/:figureId/comments and /review: the review conversation and status changes.
import { Router } from 'express';
import type { Knex } from 'knex';
import { z } from 'zod';
import { createCommentBody, idParam, reviewActionBody } from '../../shared/api/schemas';
import type { Env } from '../config/env';
import { publicUrl, sendQuietly, type Mailer } from '../mail/mailer';
import { currentUser, requireUser } from '../middleware/require-user';
import { validated } from '../middleware/validate';
import { findFigure } from '../repositories/figures';
import { authoriseFigure } from '../services/project-access';
import { addComment, applyReviewAction, listComments, listReviewEvents, reviewerEmails } from '../services/review';
import { recordAudit } from '../services/audit';

const figureParams = z.object({ figureId: idParam });

export function reviewRoutes(db: Knex, env: Env, mailer: Mailer): Router {
  const r = Router();
  r.use(requireUser);

  r.get(
    '/:figureId/comments',
    validated({ params: figureParams }, async ({ params }, req, res) => {
      await authoriseFigure(db, currentUser(req), params.figureId, 'read');
      res.json(await listComments(db, params.figureId));
    }),
  );

  r.post(
    '/:figureId/comments',
    validated({ params: figureParams, body: createCommentBody }, async ({ params, body }, req, res) => {
      const user = currentUser(req);
      await authoriseFigure(db, user, params.figureId, 'review');
      res.status(201).json(await addComment(db, user, params.figureId, body));
    }),
  );

  r.get(
    '/:figureId/review',
    validated({ params: figureParams }, async ({ params }, req, res) => {
      await authoriseFigure(db, currentUser(req), params.figureId, 'read');
      res.json(await listReviewEvents(db, params.figureId));
    }),
  );

  r.post(
    '/:figureId/review',
    validated({ params: figureParams, body: reviewActionBody }, async ({ params, body }, req, res) => {
      const user = currentUser(req);
      const { projectId, role } = await authoriseFigure(db, user, params.figureId, 'read');
      const change = await applyReviewAction(db, user, role, params.figureId, body);
      const figure = (await findFigure(db, params.figureId))!;
      await recordAudit(db, {
        projectId,
        actorId: user.id,
        action: 'figure.review',
        summary: `${change.to === 'approved' ? `approved revision ${change.revision} of` : change.to === 'in_review' ? 'submitted for review' : 'asked for changes to'} figure ${figure.number || `#${figure.id}`}`,
      });
      if (change.to === 'in_review') {
        const link = `${publicUrl(env)}/figures/${figure.id}`;
        for (const to of await reviewerEmails(db, projectId)) {
          await sendQuietly(mailer, {
            to,
            subject: `Figure ${figure.number || figure.title} needs your review`,
            text: `${user.name} submitted figure ${figure.number} "${figure.title}" (revision ${change.revision}) for review.\n\nOpen it: ${link}\n`,
          });
        }
      }
      res.json(figure);
    }),
  );
  return r;
}
