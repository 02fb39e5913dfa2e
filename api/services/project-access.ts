// Decides what the caller may do in a project: non-members get 404 (the project does not exist for
// them), members without the needed role get 403.
import type { Knex } from 'knex';
import { roleAllows, type ProjectAction, type ProjectRole } from '../../shared/api/roles';
import type { User } from '../../shared/api/schemas';
import { conflict, forbidden, notFound } from '../lib/app-error';
import { findRole } from '../repositories/projects';

const refusal: Record<ProjectAction, string> = {
  read: 'you are not a member of this project',
  review: 'only reviewers, editors and owners may review figures in this project',
  edit: 'only editors and owners may change figures in this project',
  manage: 'only owners may manage this project',
};

export async function authoriseProject(
  db: Knex,
  user: User,
  projectId: number,
  action: ProjectAction,
): Promise<ProjectRole> {
  const role = await findRole(db, user.id, projectId);
  if (!role) throw notFound('project');
  if (!roleAllows(role, action)) throw forbidden(refusal[action]);
  await refuseIfArchived(db, projectId, action);
  return role;
}

/** An archived project is read-only until an owner restores it (owners may still manage it). */
async function refuseIfArchived(db: Knex, projectId: number, action: ProjectAction): Promise<void> {
  if (action === 'read' || action === 'manage') return;
  const row = await db('projects').where({ id: projectId }).first('archived_at');
  if (row?.archived_at) throw conflict('project_archived', 'this project is archived; an owner must restore it before anything changes');
}

/** Finds the project a figure belongs to, then authorises as above (404 for figures of other projects). */
export async function authoriseFigure(
  db: Knex,
  user: User,
  figureId: number,
  action: ProjectAction,
): Promise<{ projectId: number; role: ProjectRole }> {
  const row = await db('figures').where({ id: figureId }).whereNull('deleted_at').first('project_id');
  if (!row) throw notFound('figure');
  const projectId = Number(row.project_id);
  const role = await findRole(db, user.id, projectId);
  if (!role) throw notFound('figure');
  if (!roleAllows(role, action)) throw forbidden(refusal[action]);
  await refuseIfArchived(db, projectId, action);
  return { projectId, role };
}
