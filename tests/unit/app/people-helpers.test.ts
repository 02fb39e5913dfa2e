// Pure helpers of the invitation, account, audit and admin screens.
import { describe, expect, it } from 'vitest';
import { ApiError } from '../../../app/lib/api-client';
import {
  describeExpiry,
  openInvitations,
} from '../../../app/features/invitations/utils/open-invitations';
import { invitationLinkProblem } from '../../../app/features/invitations/utils/invitation-link-problem';
import { accountLinkProblem } from '../../../app/features/account/utils/account-link-problem';
import { countOf } from '../../../app/features/account/utils/count-of';
import { auditTopic, filterAudit } from '../../../app/features/audit/utils/audit-topics';
import { filterUsers, sortUsers } from '../../../app/features/admin/utils/sort-users';
import type { AdminUser, AuditEntry, Invitation } from '../../../shared/api/schemas';

function invitation(id: number, status: Invitation['status'], createdAt: string): Invitation {
  return {
    id,
    projectId: 1,
    email: `person${id}@example.org`,
    role: 'editor',
    invitedBy: 'Ada Okafor',
    status,
    createdAt,
    expiresAt: '2026-12-09T06:00:00.000Z',
  };
}

describe('openInvitations', () => {
  it('when invitations were answered, then only pending and expired ones remain, newest first', () => {
    const list = [
      invitation(1, 'pending', '2026-12-01T10:00:00.000Z'),
      invitation(2, 'accepted', '2026-12-01T11:00:00.000Z'),
      invitation(3, 'expired', '2026-11-20T10:00:00.000Z'),
      invitation(4, 'withdrawn', '2026-12-01T12:00:00.000Z'),
      invitation(5, 'pending', '2026-12-02T09:00:00.000Z'),
    ];
    expect(openInvitations(list).map((i) => i.id)).toEqual([5, 1, 3]);
  });
});

describe('describeExpiry', () => {
  const now = new Date('2026-12-02T06:00:00.000Z');
  it('when days are left, then they are counted to the nearest day', () => {
    expect(describeExpiry('2026-12-09T06:00:00.000Z', now)).toBe('expires in 7 days');
    expect(describeExpiry('2026-12-03T12:00:00.000Z', now)).toBe('expires in 1 day');
    expect(describeExpiry('2026-12-09T05:59:00.000Z', now)).toBe('expires in 7 days');
  });
  it('when less than a day is left, then hours are counted to the nearest hour', () => {
    expect(describeExpiry('2026-12-02T09:10:00.000Z', now)).toBe('expires in 3 hours');
    expect(describeExpiry('2026-12-02T06:20:00.000Z', now)).toBe('expires in 1 hour');
  });
  it('when the time has passed, then it gives the date it expired', () => {
    expect(describeExpiry('2026-11-30T12:00:00.000Z', now)).toBe('expired on 30 Nov 2026');
  });
});

describe('invitationLinkProblem', () => {
  it('when the server names a known reason, then it is put in words', () => {
    expect(invitationLinkProblem(new ApiError(410, 'expired', 'x'))?.title).toBe(
      'This invitation has expired',
    );
    expect(invitationLinkProblem(new ApiError(409, 'withdrawn', 'x'))?.title).toBe(
      'This invitation was withdrawn',
    );
    expect(invitationLinkProblem(new ApiError(409, 'already_used', 'x'))?.title).toBe(
      'This invitation has already been accepted',
    );
  });
  it('when the problem is something else, then it is left to the general error panel', () => {
    expect(invitationLinkProblem(new ApiError(500, 'internal', 'x'))).toBeNull();
    expect(invitationLinkProblem(new Error('x'))).toBeNull();
  });
});

describe('accountLinkProblem', () => {
  it('when the token field is refused, then the link is said not to work', () => {
    const error = new ApiError(400, 'invalid_token', 'x', { token: 'not a valid link' });
    expect(accountLinkProblem(error, 'reset')?.title).toBe('This link does not work');
  });
  it('when the link is too old, then it is said to have expired and how to get a new one', () => {
    const problem = accountLinkProblem(new ApiError(410, 'expired', 'x'), 'reset');
    expect(problem?.title).toBe('This link has expired');
    expect(problem?.advice).toContain('new reset link');
  });
  it('when the password itself is refused, then it is not a link problem', () => {
    const error = new ApiError(400, 'invalid_request', 'x', { password: 'too short' });
    expect(accountLinkProblem(error, 'reset')).toBeNull();
  });
});

describe('countOf', () => {
  it('when the count is one, then the noun is singular, otherwise plural', () => {
    expect(countOf(1, 'other session', 'other sessions')).toBe('1 other session');
    expect(countOf(0, 'other session', 'other sessions')).toBe('0 other sessions');
    expect(countOf(3, 'other session', 'other sessions')).toBe('3 other sessions');
  });
});

describe('audit topics', () => {
  const entry = (id: number, action: string): AuditEntry => ({
    id,
    actorName: 'Ada Okafor',
    action,
    summary: 'did something',
    createdAt: '2026-12-02T06:00:00.000Z',
  });
  it('when actions are grouped, then members and invitations share a topic', () => {
    expect(auditTopic('member.role_changed')).toBe('people');
    expect(auditTopic('invitation.sent')).toBe('people');
    expect(auditTopic('house_style.changed')).toBe('style');
    expect(auditTopic('bundle.imported')).toBe('exports');
  });
  it('when an action is unknown, then it falls under other rather than vanishing', () => {
    expect(auditTopic('something.new')).toBe('other');
  });
  it('when filtered by a topic, then only its entries stay, in the same order', () => {
    const list = [entry(3, 'figure.saved'), entry(2, 'member.added'), entry(1, 'figure.created')];
    expect(filterAudit(list, 'figures').map((e) => e.id)).toEqual([3, 1]);
    expect(filterAudit(list, 'all').map((e) => e.id)).toEqual([3, 2, 1]);
  });
});

describe('sortUsers and filterUsers', () => {
  const user = (id: number, name: string, email: string, disabled = false): AdminUser => ({
    id,
    name,
    email,
    disabled,
    isAdmin: false,
    createdAt: '2026-01-01T00:00:00.000Z',
    projects: 0,
  });
  const list = [
    user(1, 'tomás Reyes', 'tomas@x.example'),
    user(2, 'Ada Okafor', 'ada@x.example', true),
    user(3, 'Lena Brandt', 'lena@x.example'),
  ];
  it('when sorted, then enabled accounts come first, each group by name ignoring case', () => {
    expect(sortUsers(list).map((u) => u.id)).toEqual([3, 1, 2]);
  });
  it('when filtered, then case and accents are ignored and e-mails match too', () => {
    expect(filterUsers(list, 'TOMAS').map((u) => u.id)).toEqual([1]);
    expect(filterUsers(list, 'lena@').map((u) => u.id)).toEqual([3]);
    expect(filterUsers(list, '  ').length).toBe(3);
  });
});
