// Projects and memberships: a project is only ever read through the caller's membership.
import type { Knex } from 'knex';
import type { ProjectRole } from '../../shared/api/roles';
import type { Member, Project } from '../../shared/api/schemas';

interface ProjectRow {
  id: string;
  name: string;
  description: string;
  house_style: unknown;
  archived_at: Date | null;
  created_at: Date;
  updated_at: Date;
  role: ProjectRole;
  figure_count: string;
}

const toProject = (r: ProjectRow): Project => ({
  id: Number(r.id),
  name: r.name,
  description: r.description,
  archived: r.archived_at !== null,
  role: r.role,
  figureCount: Number(r.figure_count),
  createdAt: r.created_at.toISOString(),
  updatedAt: r.updated_at.toISOString(),
});

function projectsOf(db: Knex, userId: number) {
  return db('projects as p')
    .join('memberships as m', function () {
      this.on('m.project_id', 'p.id').andOnVal('m.user_id', userId);
    })
    .select(
      'p.*',
      'm.role',
      db.raw('(select count(*) from figures f where f.project_id = p.id and f.deleted_at is null) as figure_count'),
    );
}

export async function listProjects(db: Knex, userId: number, archived: boolean): Promise<Project[]> {
  const rows: ProjectRow[] = await projectsOf(db, userId)
    .modify((q) => (archived ? q.whereNotNull('p.archived_at') : q.whereNull('p.archived_at')))
    .orderBy('p.updated_at', 'desc');
  return rows.map(toProject);
}

export async function findProject(db: Knex, userId: number, projectId: number): Promise<Project | undefined> {
  const row: ProjectRow | undefined = await projectsOf(db, userId).where('p.id', projectId).first();
  return row && toProject(row);
}

export async function findRole(db: Knex, userId: number, projectId: number): Promise<ProjectRole | undefined> {
  const row = await db('memberships').where({ project_id: projectId, user_id: userId }).first('role');
  return row?.role;
}

export async function insertProject(
  trx: Knex.Transaction,
  p: { name: string; description: string; ownerId: number },
): Promise<number> {
  const [row] = await trx('projects').insert({ name: p.name, description: p.description }).returning('id');
  const id = Number(row.id);
  await trx('memberships').insert({ project_id: id, user_id: p.ownerId, role: 'owner' });
  return id;
}

export async function updateProject(
  db: Knex,
  projectId: number,
  change: { name?: string; description?: string; archived?: boolean },
): Promise<void> {
  const patch: Record<string, unknown> = { updated_at: db.fn.now() };
  if (change.name !== undefined) patch.name = change.name;
  if (change.description !== undefined) patch.description = change.description;
  if (change.archived !== undefined) patch.archived_at = change.archived ? db.fn.now() : null;
  await db('projects').where({ id: projectId }).update(patch);
}

export async function listMembers(db: Knex, projectId: number): Promise<Member[]> {
  const rows = await db('memberships as m')
    .join('users as u', 'u.id', 'm.user_id')
    .where('m.project_id', projectId)
    .orderByRaw("array_position(array['owner','editor','reviewer','viewer'], m.role), lower(u.name)")
    .select('u.id', 'u.email', 'u.name', 'm.role');
  return rows.map((r) => ({ userId: Number(r.id), email: r.email, name: r.name, role: r.role }));
}

export async function countOwners(trx: Knex, projectId: number): Promise<number> {
  const rows = await trx('memberships').where({ project_id: projectId, role: 'owner' }).forUpdate().select('user_id');
  return rows.length;
}
