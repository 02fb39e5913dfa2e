// Invitations: owners invite, resend and withdraw (/api/projects/:projectId/invitations,
// /api/invitations/:invitationId); anyone with the link looks it up and accepts it.
import { Router } from 'express';
import type { Knex } from 'knex';
import { z } from 'zod';
import { acceptInvitationBody, createInvitationBody, idParam, tokenSchema } from '../../shared/api/schemas';
import type { Env } from '../config/env';
import { logIn, sessionBody } from '../auth/session';
import { notFound } from '../lib/app-error';
import { publicUrl, sendQuietly, type Mailer } from '../mail/mailer';
import { currentUser, requireUser } from '../middleware/require-user';
import { validated } from '../middleware/validate';
import { authoriseProject } from '../services/project-access';
import {
  acceptInvitation,
  createInvitation,
  findInvitation,
  INVITATION_DAYS,
  listInvitations,
  lookupInvitation,
  renewInvitation,
  withdrawInvitation,
} from '../services/invitations';

const projectParams = z.object({ projectId: idParam });
const invitationParams = z.object({ invitationId: idParam });

export function invitationRoutes(db: Knex, env: Env, mailer: Mailer): { project: Router; invitation: Router } {
  const sendLink = async (email: string, projectId: number, inviterName: string, role: string, token: string) => {
    const project = await db('projects').where({ id: projectId }).first('name');
    await sendQuietly(mailer, {
      to: email,
      subject: `${inviterName} invites you to "${project.name}" on Lobewright`,
      text: `${inviterName} invites you to join the project "${project.name}" as ${role}.\n\nAccept within ${INVITATION_DAYS} days: ${publicUrl(env)}/invitations/accept?token=${token}\n\nThe link works once.\n`,
    });
  };

  const project = Router();
  project.use(requireUser);
  project.get(
    '/:projectId/invitations',
    validated({ params: projectParams }, async ({ params }, req, res) => {
      await authoriseProject(db, currentUser(req), params.projectId, 'manage');
      res.json(await listInvitations(db, params.projectId));
    }),
  );
  project.post(
    '/:projectId/invitations',
    validated({ params: projectParams, body: createInvitationBody }, async ({ params, body }, req, res) => {
      const user = currentUser(req);
      await authoriseProject(db, user, params.projectId, 'manage');
      const { invitation, token } = await createInvitation(db, user, params.projectId, body);
      await sendLink(body.email, params.projectId, user.name, body.role, token);
      res.status(201).json(invitation);
    }),
  );

  const invitation = Router();
  invitation.get(
    '/lookup',
    validated({ query: z.object({ token: tokenSchema }) }, async ({ query }, _req, res) => {
      res.json(await lookupInvitation(db, query.token));
    }),
  );
  invitation.post(
    '/accept',
    validated({ body: acceptInvitationBody }, async ({ body }, req, res) => {
      const { user, projectId } = await acceptInvitation(db, req.user, body, env.BCRYPT_COST);
      if (!req.user) await logIn(req, user);
      res.json({ projectId, session: await sessionBody(db, req) });
    }),
  );
  invitation.post(
    '/:invitationId/resend',
    requireUser,
    validated({ params: invitationParams }, async ({ params }, req, res) => {
      const user = currentUser(req);
      const existing = await findInvitation(db, params.invitationId);
      if (!existing) throw notFound('invitation');
      await authoriseProject(db, user, existing.projectId, 'manage');
      const { invitation: renewed, token } = await renewInvitation(db, params.invitationId);
      await sendLink(renewed.email, renewed.projectId, user.name, renewed.role, token);
      res.json(renewed);
    }),
  );
  invitation.delete(
    '/:invitationId',
    requireUser,
    validated({ params: invitationParams }, async ({ params }, req, res) => {
      const user = currentUser(req);
      const existing = await findInvitation(db, params.invitationId);
      if (!existing) throw notFound('invitation');
      await authoriseProject(db, user, existing.projectId, 'manage');
      await withdrawInvitation(db, user, params.invitationId);
      res.status(204).end();
    }),
  );
  return { project, invitation };
}
