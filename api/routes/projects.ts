// /api/projects: projects, their members and their figure lists.
import { Router } from 'express';
import type { Knex } from 'knex';
import { z } from 'zod';
import {
  addMemberBody,
  bulkFigureBody,
  figureOrderBody,
  changeRoleBody,
  createFigureBody,
  createProjectBody,
  idParam,
  projectListQuery,
  updateProjectBody,
} from '../../shared/api/schemas';
import { houseStyleInputSchema, parseHouseStyle } from '../../shared/spec/house-style';
import { AppError, conflict, notFound } from '../lib/app-error';
import { currentUser, requireUser } from '../middleware/require-user';
import { validated } from '../middleware/validate';
import { listFigures } from '../repositories/figures';
import {
  countOwners,
  findProject,
  insertProject,
  listMembers,
  listProjects,
  updateProject,
} from '../repositories/projects';
import { findUserByEmail } from '../repositories/users';
import { createFigure } from '../services/figures';
import { bulkFigureAction, reorderFigures } from '../services/figure-list';
import { authoriseProject } from '../services/project-access';
import { listAudit, recordAudit } from '../services/audit';

const projectParams = z.object({ projectId: idParam });
const memberParams = z.object({ projectId: idParam, userId: idParam });

export function projectRoutes(db: Knex, enqueueRerender: ((projectId: number) => Promise<string | null>) | null): Router {
  const r = Router();
  r.use(requireUser);

  r.get(
    '/',
    validated({ query: projectListQuery }, async ({ query }, req, res) => {
      res.json(await listProjects(db, currentUser(req).id, query.archived));
    }),
  );

  r.post(
    '/',
    validated({ body: createProjectBody }, async ({ body }, req, res) => {
      const user = currentUser(req);
      const id = await db.transaction((trx) => insertProject(trx, { ...body, ownerId: user.id }));
      res.status(201).json(await findProject(db, user.id, id));
    }),
  );

  r.get(
    '/:projectId',
    validated({ params: projectParams }, async ({ params }, req, res) => {
      const user = currentUser(req);
      await authoriseProject(db, user, params.projectId, 'read');
      res.json(await findProject(db, user.id, params.projectId));
    }),
  );

  r.patch(
    '/:projectId',
    validated({ params: projectParams, body: updateProjectBody }, async ({ params, body }, req, res) => {
      const user = currentUser(req);
      await authoriseProject(db, user, params.projectId, 'manage');
      await updateProject(db, params.projectId, body);
      const audit = (action: 'project.renamed' | 'project.archived' | 'project.restored', summary: string) =>
        recordAudit(db, { projectId: params.projectId, actorId: user.id, action, summary });
      if (body.name !== undefined) await audit('project.renamed', `renamed the project to "${body.name}"`);
      if (body.archived === true) await audit('project.archived', 'archived the project');
      if (body.archived === false) await audit('project.restored', 'restored the project from the archive');
      res.json(await findProject(db, user.id, params.projectId));
    }),
  );

  // ── House style ───────────────────────────────────────────────────────────
  r.get(
    '/:projectId/house-style',
    validated({ params: projectParams }, async ({ params }, req, res) => {
      await authoriseProject(db, currentUser(req), params.projectId, 'read');
      const row = await db('projects').where({ id: params.projectId }).first('house_style');
      res.json(parseHouseStyle(row.house_style));
    }),
  );

  r.put(
    '/:projectId/house-style',
    validated({ params: projectParams, body: houseStyleInputSchema }, async ({ params, body }, req, res) => {
      await authoriseProject(db, currentUser(req), params.projectId, 'manage');
      await db('projects')
        .where({ id: params.projectId })
        .update({ house_style: JSON.stringify(body), updated_at: db.fn.now() });
      const changed = [...Object.keys(body.look), ...Object.keys(body.print)].join(', ') || 'reset to the defaults';
      await recordAudit(db, { projectId: params.projectId, actorId: currentUser(req).id, action: 'house_style.changed', summary: `changed the house style (${changed})` });
      // Figures that follow the house style now print differently: render them again in the background.
      await enqueueRerender?.(params.projectId);
      res.json(parseHouseStyle(body));
    }),
  );

  r.get(
    '/:projectId/audit',
    validated({ params: projectParams }, async ({ params }, req, res) => {
      await authoriseProject(db, currentUser(req), params.projectId, 'manage');
      res.json(await listAudit(db, params.projectId));
    }),
  );

  // ── Members ───────────────────────────────────────────────────────────────
  r.get(
    '/:projectId/members',
    validated({ params: projectParams }, async ({ params }, req, res) => {
      await authoriseProject(db, currentUser(req), params.projectId, 'read');
      res.json(await listMembers(db, params.projectId));
    }),
  );

  r.post(
    '/:projectId/members',
    validated({ params: projectParams, body: addMemberBody }, async ({ params, body }, req, res) => {
      await authoriseProject(db, currentUser(req), params.projectId, 'manage');
      const user = await findUserByEmail(db, body.email);
      if (!user)
        throw new AppError(422, 'unknown_user', 'no account has this e-mail address', {
          email: 'no account has this e-mail address',
        });
      const inserted = await db('memberships')
        .insert({ project_id: params.projectId, user_id: user.id, role: body.role })
        .onConflict(['project_id', 'user_id'])
        .ignore()
        .returning('user_id');
      if (inserted.length === 0)
        throw conflict('already_member', `${user.name} is already a member of this project`);
      const member = (await listMembers(db, params.projectId)).find((m) => m.userId === Number(user.id));
      await recordAudit(db, { projectId: params.projectId, actorId: currentUser(req).id, action: 'member.added', summary: `added ${user.name} as ${body.role}` });
      res.status(201).json(member);
    }),
  );

  r.patch(
    '/:projectId/members/:userId',
    validated({ params: memberParams, body: changeRoleBody }, async ({ params, body }, req, res) => {
      await authoriseProject(db, currentUser(req), params.projectId, 'manage');
      await db.transaction(async (trx) => {
        const owners = await countOwners(trx, params.projectId);
        const row = await trx('memberships').where({ project_id: params.projectId, user_id: params.userId }).first();
        if (!row) throw notFound('member');
        if (row.role === 'owner' && body.role !== 'owner' && owners <= 1)
          throw conflict('last_owner', 'a project needs at least one owner; make someone else an owner first');
        await trx('memberships').where({ project_id: params.projectId, user_id: params.userId }).update({ role: body.role });
      });
      const member = (await listMembers(db, params.projectId)).find((m) => m.userId === params.userId);
      await recordAudit(db, { projectId: params.projectId, actorId: currentUser(req).id, action: 'member.role_changed', summary: `made ${member?.name} ${body.role}` });
      res.json(member);
    }),
  );

  r.delete(
    '/:projectId/members/:userId',
    validated({ params: memberParams }, async ({ params }, req, res) => {
      await authoriseProject(db, currentUser(req), params.projectId, 'manage');
      await db.transaction(async (trx) => {
        const owners = await countOwners(trx, params.projectId);
        const row = await trx('memberships').where({ project_id: params.projectId, user_id: params.userId }).first();
        if (!row) throw notFound('member');
        if (row.role === 'owner' && owners <= 1)
          throw conflict('last_owner', 'the last owner cannot be removed; make someone else an owner first');
        await trx('memberships').where({ project_id: params.projectId, user_id: params.userId }).delete();
        const removed = await trx('users').where({ id: params.userId }).first('name');
        await recordAudit(trx, { projectId: params.projectId, actorId: currentUser(req).id, action: 'member.removed', summary: `removed ${removed.name} (${row.role})` });
      });
      res.status(204).end();
    }),
  );

  // ── Figures of a project ──────────────────────────────────────────────────
  r.get(
    '/:projectId/figures',
    validated({ params: projectParams }, async ({ params }, req, res) => {
      await authoriseProject(db, currentUser(req), params.projectId, 'read');
      res.json(await listFigures(db, params.projectId));
    }),
  );

  r.put(
    '/:projectId/figures/order',
    validated({ params: projectParams, body: figureOrderBody }, async ({ params, body }, req, res) => {
      await authoriseProject(db, currentUser(req), params.projectId, 'edit');
      await reorderFigures(db, params.projectId, body);
      await recordAudit(db, { projectId: params.projectId, actorId: currentUser(req).id, action: 'figure.reordered', summary: `put the figures in the order ${body.figures.map((f) => f.number || `#${f.id}`).join(', ')}` });
      res.json(await listFigures(db, params.projectId));
    }),
  );

  r.post(
    '/:projectId/figures/bulk',
    validated({ params: projectParams, body: bulkFigureBody }, async ({ params, body }, req, res) => {
      const user = currentUser(req);
      const role = await authoriseProject(db, user, params.projectId, 'edit');
      res.json(await bulkFigureAction(db, user, role, params.projectId, body));
    }),
  );

  r.post(
    '/:projectId/figures',
    validated({ params: projectParams, body: createFigureBody }, async ({ params, body }, req, res) => {
      const user = currentUser(req);
      await authoriseProject(db, user, params.projectId, 'edit');
      const figure = await createFigure(db, user, params.projectId, body);
      await recordAudit(db, { projectId: params.projectId, actorId: user.id, action: 'figure.created', summary: `created figure ${figure.number || `#${figure.id}`} "${figure.title}"` });
      res.status(201).json(figure);
    }),
  );
  return r;
}
