// Project roles and what each may do: the one table the server and the client both consult.
import { z } from 'zod';

export const projectRoles = ['owner', 'editor', 'reviewer', 'viewer'] as const;
export const projectRoleSchema = z.enum(projectRoles);
export type ProjectRole = z.infer<typeof projectRoleSchema>;

/** What a project member may do. Each role includes the ones below it. */
export type ProjectAction =
  | 'read' // see the project, its figures, revisions and comments
  | 'review' // comment and set review status
  | 'edit' // create, change, duplicate and delete figures
  | 'manage'; // rename, archive, manage members and house style

const rank: Record<ProjectRole, number> = { viewer: 0, reviewer: 1, editor: 2, owner: 3 };
const needed: Record<ProjectAction, number> = { read: 0, review: 1, edit: 2, manage: 3 };

export function roleAllows(role: ProjectRole, action: ProjectAction): boolean {
  return rank[role] >= needed[action];
}

export const roleDescriptions: Record<ProjectRole, string> = {
  owner: 'Manages members and house style, and everything an editor does',
  editor: 'Creates and changes figures, and everything a reviewer does',
  reviewer: 'Comments on figures and sets their review status',
  viewer: 'Reads the project and its figures',
};
