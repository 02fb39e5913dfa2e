// Invitations by e-mail: owners invite with a role; the single-use link expires after 7 days;
// accepting adds the membership (creating the account first when there is none).
import type { Knex } from 'knex';
import type { z } from 'zod';
import type { acceptInvitationBody, Invitation, InvitationLookup, User } from '../../shared/api/schemas';
import type { ProjectRole } from '../../shared/api/roles';
import { AppError, conflict, notFound } from '../lib/app-error';
import { hashToken, newToken } from '../lib/tokens';
import { findUserByEmail, insertUser, toUser } from '../repositories/users';
import { hashPassword } from '../auth/passwords';
import { recordAudit } from './audit';

export const INVITATION_DAYS = 7;

interface InvitationRow {
  id: string;
  project_id: string;
  email: string;
  role: ProjectRole;
  invited_by_name: string;
  expires_at: Date;
  accepted_at: Date | null;
  withdrawn_at: Date | null;
  created_at: Date;
}

function statusOf(r: InvitationRow, now = new Date()): Invitation['status'] {
  if (r.accepted_at) return 'accepted';
  if (r.withdrawn_at) return 'withdrawn';
  return r.expires_at <= now ? 'expired' : 'pending';
}

const toInvitation = (r: InvitationRow): Invitation => ({
  id: Number(r.id),
  projectId: Number(r.project_id),
  email: r.email,
  role: r.role,
  invitedBy: r.invited_by_name,
  status: statusOf(r),
  createdAt: r.created_at.toISOString(),
  expiresAt: r.expires_at.toISOString(),
});

function invitations(db: Knex) {
  return db('invitations as i').join('users as u', 'u.id', 'i.invited_by').select('i.*', 'u.name as invited_by_name');
}

export async function listInvitations(db: Knex, projectId: number): Promise<Invitation[]> {
  const rows: InvitationRow[] = await invitations(db).where('i.project_id', projectId).orderBy('i.id', 'desc');
  return rows.map(toInvitation);
}

export async function findInvitation(db: Knex, id: number): Promise<Invitation | undefined> {
  const row: InvitationRow | undefined = await invitations(db).where('i.id', id).first();
  return row && toInvitation(row);
}

const expiry = () => new Date(Date.now() + INVITATION_DAYS * 24 * 3600 * 1000);

export async function createInvitation(
  db: Knex,
  inviter: User,
  projectId: number,
  input: { email: string; role: ProjectRole },
): Promise<{ invitation: Invitation; token: string }> {
  const existing = await findUserByEmail(db, input.email);
  if (existing) {
    const member = await db('memberships').where({ project_id: projectId, user_id: existing.id }).first();
    if (member) throw conflict('already_member', `${existing.name} is already a member of this project`);
  }
  const { token, hash } = newToken();
  const [row] = await db('invitations')
    .insert({ project_id: projectId, email: input.email, role: input.role, invited_by: inviter.id, token_hash: hash, expires_at: expiry() })
    .returning('id');
  await recordAudit(db, { projectId, actorId: inviter.id, action: 'invitation.sent', summary: `invited ${input.email} as ${input.role}` });
  return { invitation: (await findInvitation(db, Number(row.id)))!, token };
}

/** A new link for a pending or expired invitation (the old link stops working). */
export async function renewInvitation(db: Knex, id: number): Promise<{ invitation: Invitation; token: string }> {
  const row = await db('invitations').where({ id }).first();
  if (!row) throw notFound('invitation');
  if (row.accepted_at) throw conflict('already_used', 'this invitation has been accepted');
  if (row.withdrawn_at) throw conflict('withdrawn', 'this invitation was withdrawn');
  const { token, hash } = newToken();
  await db('invitations').where({ id }).update({ token_hash: hash, expires_at: expiry() });
  return { invitation: (await findInvitation(db, id))!, token };
}

export async function withdrawInvitation(db: Knex, actor: User, id: number): Promise<void> {
  const row = await db('invitations').where({ id }).first();
  if (!row) throw notFound('invitation');
  if (row.accepted_at) throw conflict('already_used', 'this invitation has been accepted');
  await db('invitations').where({ id }).update({ withdrawn_at: db.fn.now() });
  await recordAudit(db, { projectId: Number(row.project_id), actorId: actor.id, action: 'invitation.withdrawn', summary: `withdrew the invitation of ${row.email}` });
}

async function usableInvitation(db: Knex, token: string) {
  const row = await db('invitations as i')
    .join('projects as p', 'p.id', 'i.project_id')
    .join('users as u', 'u.id', 'i.invited_by')
    .where('i.token_hash', hashToken(token))
    .first('i.*', 'p.name as project_name', 'u.name as invited_by_name');
  if (!row) throw new AppError(404, 'invalid_token', 'this invitation link is not valid', { token: 'not a valid invitation link' });
  if (row.accepted_at) throw conflict('already_used', 'this invitation has already been accepted');
  if (row.withdrawn_at) throw conflict('withdrawn', 'this invitation was withdrawn by the project owner');
  if (row.expires_at <= new Date()) throw new AppError(410, 'expired', 'this invitation has expired; ask the project owner to send it again');
  return row;
}

export async function lookupInvitation(db: Knex, token: string): Promise<InvitationLookup> {
  const row = await usableInvitation(db, token);
  return {
    projectName: row.project_name,
    email: row.email,
    role: row.role,
    invitedBy: row.invited_by_name,
    accountExists: !!(await findUserByEmail(db, row.email)),
  };
}

/** Accepts an invitation; returns the user who is (or is now) signed in, and the project. */
export async function acceptInvitation(
  db: Knex,
  signedIn: User | undefined,
  input: z.output<typeof acceptInvitationBody>,
  bcryptCost: number,
): Promise<{ user: User; projectId: number }> {
  return db.transaction(async (trx) => {
    const inv = await usableInvitation(trx, input.token);
    await trx('invitations').where({ id: inv.id }).forUpdate().first();
    const existing = await findUserByEmail(trx, inv.email);
    let user: User;
    if (existing) {
      if (!signedIn) throw new AppError(401, 'sign_in_first', `an account for ${inv.email} exists: sign in as it, then open the link again`);
      if (signedIn.id !== Number(existing.id)) {
        throw new AppError(403, 'wrong_account', `this invitation is for ${inv.email}; you are signed in as ${signedIn.email}`);
      }
      user = signedIn;
    } else {
      const fields: Record<string, string> = {};
      if (!input.name) fields.name = 'your name is needed to create the account';
      if (!input.password) fields.password = 'choose a password of at least 10 characters';
      if (Object.keys(fields).length) throw new AppError(400, 'invalid_request', 'name and password are needed to create your account', fields);
      user = toUser(await insertUser(trx, { email: inv.email, name: input.name!, passwordHash: await hashPassword(input.password!, bcryptCost) }));
    }
    await trx('memberships')
      .insert({ project_id: inv.project_id, user_id: user.id, role: inv.role })
      .onConflict(['project_id', 'user_id'])
      .ignore();
    await trx('invitations').where({ id: inv.id }).update({ accepted_at: trx.fn.now() });
    await recordAudit(trx, { projectId: Number(inv.project_id), actorId: user.id, action: 'invitation.accepted', summary: `${user.name} joined as ${inv.role}` });
    return { user, projectId: Number(inv.project_id) };
  });
}
