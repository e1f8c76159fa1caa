import { LANGUAGES, type Language } from '../i18n/languages';
import { z } from 'zod';
import { GROUP_ROLES } from '../constants';

export const email = z
  .string({ error: 'validation.email.required' })
  .trim()
  .toLowerCase()
  .min(1, 'validation.email.required')
  .max(254, 'validation.email.tooLong')
  .pipe(z.email({ error: 'validation.email.invalid' }));

/** OWASP ASVS: at least 8 characters when no other rule applies; we ask for 10 and cap at 128. */
export const newPassword = z
  .string({ error: 'validation.password.required' })
  .min(10, 'validation.password.tooShort')
  .max(128, 'validation.password.tooLong');

export const loginSchema = z.object({
  email,
  password: z.string({ error: 'validation.password.enter' }).min(1, 'validation.password.enter').max(128),
});
export type LoginInput = z.infer<typeof loginSchema>;

export const signupSchema = z.object({
  name: z
    .string({ error: 'validation.name.required' })
    .trim()
    .min(1, 'validation.name.required')
    .max(120, 'validation.name.tooLong'),
  email,
  password: newPassword,
  groupId: z.coerce.number({ error: 'validation.group.required' }).int().positive('validation.group.required'),
  role: z.enum(['fixer', 'host'], { error: 'validation.role.help' }),
});
export type SignupInput = z.infer<typeof signupSchema>;

export const tokenSchema = z.object({ token: z.string().min(20, 'validation.link.incomplete').max(200) });

export const resetRequestSchema = z.object({ email });

export const resetConfirmSchema = z
  .object({
    token: z.string().min(20, 'validation.link.incomplete').max(200),
    password: newPassword,
    confirm: z.string(),
  })
  .refine((v) => v.password === v.confirm, { path: ['confirm'], message: 'validation.password.differ' });

export const firstAdminSchema = z
  .object({
    name: z.string().trim().min(1, 'validation.name.required').max(120),
    email,
    password: newPassword,
    confirm: z.string(),
    setupCode: z
      .string({ error: 'validation.setupCode.required' })
      .trim()
      .min(1, 'validation.setupCode.required')
      .max(200),
  })
  .refine((v) => v.password === v.confirm, { path: ['confirm'], message: 'validation.password.differ' });
export type FirstAdminInput = z.infer<typeof firstAdminSchema>;

/** A signed-in person changes their own password: the current one proves it is them. */
export const changePasswordSchema = z
  .object({
    currentPassword: z.string({ error: 'validation.password.current' }).min(1, 'validation.password.current').max(128),
    password: newPassword,
    confirm: z.string({ error: 'validation.password.again' }).max(128),
  })
  .refine((v) => v.password === v.confirm, { path: ['confirm'], message: 'validation.password.differ' });
export type ChangePasswordInput = z.infer<typeof changePasswordSchema>;

/** A code from an authenticator app: 6 digits; spaces (as some apps show them) are dropped. */
export const totpCode = z
  .string({ error: 'validation.totp.digits' })
  .max(20, 'validation.totp.digits')
  .transform((v) => v.replace(/\s+/g, ''))
  .pipe(z.string().regex(/^\d{6}$/, 'validation.totp.digits'));
export const totpCodeSchema = z.object({ code: totpCode });
export const turnOffTwoFactorSchema = z.object({
  password: z.string({ error: 'validation.password.enter' }).min(1, 'validation.password.enter').max(128),
  code: totpCode,
});

export const groupSchema = z.object({
  name: z.string().trim().min(2, 'validation.group.name').max(120),
  town: z.string().trim().min(1, 'validation.town.required').max(120),
  description: z.string().trim().max(2000).default(''),
});

export interface SessionUser {
  id: number;
  email: string;
  name: string;
  admin: boolean;
  roles: { groupId: number; role: (typeof GROUP_ROLES)[number]; groupName: string }[];
  /** The language the person chose for the app; null until they choose one (the browser's decides meanwhile). */
  language: Language | null;
}

/** A signed-in person's choice of language, kept on their account. */
export const accountLanguageSchema = z.object({
  language: z.enum(LANGUAGES, { error: 'validation.language.unknown' }),
});

export const inviteSchema = z.object({ email, role: z.enum(GROUP_ROLES, { error: 'validation.role.required' }) });
export const inviteSignupSchema = z.object({
  name: z.string().trim().min(1, 'validation.name.required').max(120),
  password: newPassword,
});

/** An admin merges a group made by a network import into the group its records belong to. */
export const mergeGroupSchema = z.object({
  into: z.coerce.number({ error: 'validation.group.required' }).int().positive('validation.group.required'),
});
