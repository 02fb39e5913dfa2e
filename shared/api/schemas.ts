// Request and response shapes of the HTTP API, shared by the Express routes and the React client.
import { z } from 'zod';
import { projectRoleSchema } from './roles';
import { figureSpecSchema } from '../spec/figure-spec';

const trimmed = (min: number, max: number) => z.string().trim().min(min).max(max);

export const idParam = z.coerce.number().int().positive();

// ── Auth ────────────────────────────────────────────────────────────────────
export const emailSchema = z.string().trim().toLowerCase().pipe(z.email().max(254));
export const passwordSchema = z
  .string()
  .min(10, 'must be at least 10 characters')
  .max(200, 'must be at most 200 characters');

export const loginBody = z.object({ email: emailSchema, password: z.string().min(1).max(200) });
export const signupBody = z.object({
  email: emailSchema,
  name: trimmed(1, 120),
  password: passwordSchema,
});

export const userSchema = z.object({
  id: z.number(),
  email: z.string(),
  name: z.string(),
  isAdmin: z.boolean(),
});
export type User = z.infer<typeof userSchema>;

export const sessionSchema = z.object({
  user: userSchema.nullable(),
  csrfToken: z.string(),
  signupEnabled: z.boolean(),
});
export type Session = z.infer<typeof sessionSchema>;

export const siteSettingsSchema = z.object({ signupEnabled: z.boolean() });
export type SiteSettings = z.infer<typeof siteSettingsSchema>;

// ── Projects ────────────────────────────────────────────────────────────────
export const projectSchema = z.object({
  id: z.number(),
  name: z.string(),
  description: z.string(),
  archived: z.boolean(),
  role: projectRoleSchema,
  figureCount: z.number(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Project = z.infer<typeof projectSchema>;

export const projectListQuery = z.object({
  archived: z.enum(['true', 'false']).optional().transform((v) => v === 'true'),
});
export const createProjectBody = z.object({
  name: trimmed(1, 200),
  description: z.string().trim().max(2000).default(''),
});
export const updateProjectBody = z
  .object({
    name: trimmed(1, 200).optional(),
    description: z.string().trim().max(2000).optional(),
    archived: z.boolean().optional(),
  })
  .refine((b) => Object.keys(b).length > 0, { message: 'nothing to change' });

// ── Members ─────────────────────────────────────────────────────────────────
export const memberSchema = z.object({
  userId: z.number(),
  email: z.string(),
  name: z.string(),
  role: projectRoleSchema,
});
export type Member = z.infer<typeof memberSchema>;
export const addMemberBody = z.object({ email: emailSchema, role: projectRoleSchema });
export const changeRoleBody = z.object({ role: projectRoleSchema });

// ── Figures ─────────────────────────────────────────────────────────────────
export const figureStatuses = ['draft', 'in_review', 'changes_requested', 'approved'] as const;
export const figureStatusSchema = z.enum(figureStatuses);
export type FigureStatus = z.infer<typeof figureStatusSchema>;

/** Author's figure number such as "4.1" or "4.2a". */
export const figureNumberSchema = z
  .string()
  .trim()
  .max(20)
  .regex(/^([0-9A-Za-z][0-9A-Za-z.-]*)?$/, 'use digits, letters, dots and dashes, e.g. 4.2a');

export const figureSummarySchema = z.object({
  id: z.number(),
  projectId: z.number(),
  number: z.string(),
  title: z.string(),
  caption: z.string(),
  altText: z.string(),
  status: figureStatusSchema,
  kind: z.string(),
  revision: z.number(),
  approvedRevision: z.number().nullable(),
  updatedAt: z.string(),
  updatedBy: z.string(),
  /** True when every print format of the figure is rendered from its current spec and house style. */
  printFilesCurrent: z.boolean(),
});
export type FigureSummary = z.infer<typeof figureSummarySchema>;

export const figureSchema = figureSummarySchema.extend({ spec: figureSpecSchema });
export type Figure = z.infer<typeof figureSchema>;

export const createFigureBody = z.object({
  number: figureNumberSchema.default(''),
  title: trimmed(1, 200),
  caption: z.string().trim().max(4000).default(''),
  altText: z.string().trim().max(4000).default(''),
  spec: figureSpecSchema,
});
export const updateFigureBody = z.object({
  baseRevision: z.number().int().positive(),
  number: figureNumberSchema.optional(),
  title: trimmed(1, 200).optional(),
  caption: z.string().trim().max(4000).optional(),
  altText: z.string().trim().max(4000).optional(),
  spec: figureSpecSchema.optional(),
  message: z.string().trim().max(500).default(''),
});

export const revisionSummarySchema = z.object({
  revision: z.number(),
  authorName: z.string(),
  createdAt: z.string(),
  message: z.string(),
  specHash: z.string(),
  /** Dotted paths of what changed against the revision before ("title", "spec.kind.enclosed", …). */
  changedFields: z.array(z.string()),
});
export type RevisionSummary = z.infer<typeof revisionSummarySchema>;
export const revisionSchema = revisionSummarySchema.extend({
  title: z.string(),
  caption: z.string(),
  altText: z.string(),
  number: z.string(),
  spec: figureSpecSchema,
});
export type Revision = z.infer<typeof revisionSchema>;

// ── Errors ──────────────────────────────────────────────────────────────────
export const apiErrorSchema = z.object({
  error: z.object({
    code: z.string(),
    message: z.string(),
    fields: z.record(z.string(), z.string()).optional(),
    details: z.record(z.string(), z.unknown()).optional(),
  }),
});
export type ApiErrorBody = z.infer<typeof apiErrorSchema>;

// ── Review ──────────────────────────────────────────────────────────────────
export const commentSchema = z.object({
  id: z.number(),
  figureId: z.number(),
  revision: z.number(),
  parentId: z.number().nullable(),
  authorName: z.string(),
  body: z.string(),
  createdAt: z.string(),
});
export type Comment = z.infer<typeof commentSchema>;
export const createCommentBody = z.object({
  body: z.string().trim().min(1, 'write something').max(4000),
  parentId: z.number().int().positive().optional(),
});

export const reviewActions = ['submit', 'request_changes', 'approve'] as const;
export const reviewActionBody = z
  .object({ action: z.enum(reviewActions), note: z.string().trim().max(2000).default('') })
  .refine((b) => b.action !== 'request_changes' || b.note.length > 0, {
    path: ['note'],
    message: 'say what should change',
  });
export const reviewEventSchema = z.object({
  id: z.number(),
  revision: z.number(),
  actorName: z.string(),
  fromStatus: figureStatusSchema,
  toStatus: figureStatusSchema,
  note: z.string(),
  createdAt: z.string(),
});
export type ReviewEvent = z.infer<typeof reviewEventSchema>;

// ── Figure list order and bulk actions ─────────────────────────────────────
export const figureOrderBody = z.object({
  figures: z
    .array(z.object({ id: z.number().int().positive(), number: figureNumberSchema }))
    .min(1)
    .max(1000)
    .refine((a) => new Set(a.map((f) => f.id)).size === a.length, 'each figure may appear once')
    .refine(
      (a) => {
        const numbers = a.map((f) => f.number).filter(Boolean);
        return new Set(numbers).size === numbers.length;
      },
      'figure numbers must be different',
    ),
});
export const bulkFigureBody = z.object({
  ids: z.array(z.number().int().positive()).min(1).max(500),
  action: z.enum(['submit', 'delete']),
});

// ── Export runs ─────────────────────────────────────────────────────────────
export const exportFormatSchema = z.enum(['png', 'tiff', 'pdf', 'svg']);
export const MAX_EXPORT_FIGURES = 200;
export const createExportBody = z.object({
  selection: z.discriminatedUnion('mode', [
    z.object({ mode: z.literal('all') }),
    z.object({ mode: z.literal('approved') }),
    z.object({ mode: z.literal('selected'), ids: z.array(z.number().int().positive()).min(1).max(MAX_EXPORT_FIGURES) }),
  ]),
  formats: z.array(exportFormatSchema).min(1).max(4).refine((f) => new Set(f).size === f.length, 'list each format once'),
});
export const exportRunStatuses = ['queued', 'running', 'succeeded', 'failed'] as const;
export const exportRunSchema = z.object({
  id: z.number(),
  projectId: z.number(),
  status: z.enum(exportRunStatuses),
  startedBy: z.string(),
  formats: z.array(exportFormatSchema),
  selection: z.string(),
  done: z.number(),
  total: z.number(),
  currentItem: z.string().nullable(),
  errors: z.array(z.object({ figure: z.string(), message: z.string() })),
  createdAt: z.string(),
  finishedAt: z.string().nullable(),
  bundle: z.object({ filename: z.string(), size: z.number(), sha256: z.string() }).nullable(),
});
export type ExportRun = z.infer<typeof exportRunSchema>;

// ── Invitations, password reset, account, admin users, audit ───────────────
export const invitationStatuses = ['pending', 'accepted', 'withdrawn', 'expired'] as const;
export const invitationSchema = z.object({
  id: z.number(),
  projectId: z.number(),
  email: z.string(),
  role: projectRoleSchema,
  invitedBy: z.string(),
  status: z.enum(invitationStatuses),
  createdAt: z.string(),
  expiresAt: z.string(),
});
export type Invitation = z.infer<typeof invitationSchema>;
export const createInvitationBody = z.object({ email: emailSchema, role: projectRoleSchema });
export const tokenSchema = z.string().regex(/^[A-Za-z0-9_-]{32,64}$/, 'this link is not valid');
export const invitationLookupSchema = z.object({
  projectName: z.string(),
  email: z.string(),
  role: projectRoleSchema,
  invitedBy: z.string(),
  accountExists: z.boolean(),
});
export type InvitationLookup = z.infer<typeof invitationLookupSchema>;
export const acceptInvitationBody = z.object({
  token: tokenSchema,
  /** Needed only when no account has the invited e-mail yet. */
  name: trimmed(1, 120).optional(),
  password: passwordSchema.optional(),
});
export const acceptInvitationResultSchema = z.object({ projectId: z.number(), session: sessionSchema });

export const passwordResetRequestBody = z.object({ email: emailSchema });
export const passwordResetConfirmBody = z.object({ token: tokenSchema, password: passwordSchema });

export const accountSchema = z.object({
  user: userSchema,
  createdAt: z.string(),
  otherSessions: z.number(),
});
export type Account = z.infer<typeof accountSchema>;
export const updateAccountBody = z.object({ name: trimmed(1, 120) });
export const changePasswordBody = z.object({ currentPassword: z.string().min(1).max(200), newPassword: passwordSchema });
export const changeEmailBody = z.object({ newEmail: emailSchema, password: z.string().min(1).max(200) });
export const confirmEmailBody = z.object({ token: tokenSchema });

export const adminUserSchema = z.object({
  id: z.number(),
  email: z.string(),
  name: z.string(),
  isAdmin: z.boolean(),
  disabled: z.boolean(),
  createdAt: z.string(),
  projects: z.number(),
});
export type AdminUser = z.infer<typeof adminUserSchema>;
export const updateAdminUserBody = z
  .object({ disabled: z.boolean().optional(), isAdmin: z.boolean().optional() })
  .refine((b) => b.disabled !== undefined || b.isAdmin !== undefined, { message: 'nothing to change' });

export const auditEntrySchema = z.object({
  id: z.number(),
  actorName: z.string(),
  action: z.string(),
  summary: z.string(),
  createdAt: z.string(),
});
export type AuditEntry = z.infer<typeof auditEntrySchema>;
