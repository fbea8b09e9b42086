/** `/api/auth/*`: registration, sign-in, the signed-in user and password reset. */
import { z } from 'zod';

/** The three roles: `admin` manages users, `instructor` also runs classes, `member` builds systems. */
export const UserRoleSchema = z.enum(['admin', 'instructor', 'member']);
/** A role. */
export type UserRole = z.infer<typeof UserRoleSchema>;

/** The unit system a user reads and types quantities in. */
export const UnitSystemSchema = z.enum(['metric', 'us']);
/** `metric` or `us` (US customary). */
export type UnitSystem = z.infer<typeof UnitSystemSchema>;

/** The signed-in user as every endpoint shows them. */
export const UserSchema = z.object({
  id: z.string(),
  email: z.string(),
  name: z.string(),
  role: UserRoleSchema,
  units: UnitSystemSchema,
});
/** The signed-in user. */
export type User = z.infer<typeof UserSchema>;

/** An e-mail address, trimmed and lower-cased (addresses are matched without case). */
export const EmailSchema = z
  .string()
  .trim()
  .toLowerCase()
  .max(254, 'An e-mail address has at most 254 characters.')
  .pipe(z.email('Enter an e-mail address such as name@example.org.'));

/** The shortest password accepted; length is what makes a password hard to guess. */
export const PASSWORD_MIN_LENGTH = 10;
/** bcrypt reads only the first 72 bytes of a password, so longer ones are refused, not cut. */
export const PASSWORD_MAX_BYTES = 72;

/** Passwords seen so often in breach lists that the length rule alone lets them through. */
const COMMON_PASSWORDS = new Set([
  '1234567890',
  '12345678910',
  '0123456789',
  'qwertyuiop',
  'password123',
  'password1234',
  'passwordpassword',
  '1q2w3e4r5t',
  'iloveyou123',
  'letmein123',
  'welcome123',
  'qwerty12345',
  'abcdefghij',
  'administrator',
]);

/**
 * The password rule: at least 10 characters, at most 72 bytes, at least 5 different characters,
 * not a well-known password. Length over composition, as NIST SP 800-63B §5.1.1.2 recommends.
 */
export const PasswordSchema = z
  .string()
  .min(
    PASSWORD_MIN_LENGTH,
    `Use at least ${PASSWORD_MIN_LENGTH} characters; a short sentence works well.`,
  )
  .refine((value) => new TextEncoder().encode(value).length <= PASSWORD_MAX_BYTES, {
    message: `Use at most ${PASSWORD_MAX_BYTES} bytes (about ${PASSWORD_MAX_BYTES} letters).`,
  })
  .refine((value) => new Set(value).size >= 5, {
    message: 'Use at least 5 different characters.',
  })
  .refine((value) => !COMMON_PASSWORDS.has(value.toLowerCase()), {
    message: 'That password is on every list of common passwords; choose another.',
  });

/** `POST /api/auth/register`. */
export const RegisterRequestSchema = z
  .strictObject({
    name: z
      .string()
      .trim()
      .min(1, 'Enter your name.')
      .max(120, 'A name has at most 120 characters.'),
    email: EmailSchema,
    password: PasswordSchema,
  })
  .superRefine((value, ctx) => {
    const localPart = value.email.split('@')[0] ?? '';
    if (localPart.length >= 4 && value.password.toLowerCase().includes(localPart)) {
      ctx.addIssue({
        code: 'custom',
        path: ['password'],
        message: 'Do not use your e-mail name in the password.',
      });
    }
  });
/** A registration. */
export type RegisterRequest = z.infer<typeof RegisterRequestSchema>;

/** `POST /api/auth/login`. The address is not format-checked: a wrong one is simply a 401. */
export const LoginRequestSchema = z.strictObject({
  email: z.string().trim().toLowerCase().min(1, 'Enter your e-mail address.').max(254),
  password: z.string().min(1, 'Enter your password.').max(1024),
});
/** A sign-in. */
export type LoginRequest = z.infer<typeof LoginRequestSchema>;

/** Answer of register, login and `GET /api/auth/me`. */
export const MeResponseSchema = z.object({ user: UserSchema });
/** `{user}`. */
export type MeResponse = z.infer<typeof MeResponseSchema>;

/** `PATCH /api/auth/me`: what users may change about themselves. */
export const UpdateMeRequestSchema = z.strictObject({
  name: z.string().trim().min(1, 'Enter your name.').max(120).optional(),
  units: UnitSystemSchema.optional(),
});
/** A change to one's own profile. */
export type UpdateMeRequest = z.infer<typeof UpdateMeRequestSchema>;

/** `POST /api/auth/password-reset`: always answered 202, whether or not the address has an account. */
export const PasswordResetRequestSchema = z.strictObject({ email: EmailSchema });
/** A reset request. */
export type PasswordResetRequest = z.infer<typeof PasswordResetRequestSchema>;

/** The 202 answer to a reset request: the same words whether or not the address has an account. */
export const PasswordResetAcceptedSchema = z.object({ message: z.string() });
/** `{message}`. */
export type PasswordResetAccepted = z.infer<typeof PasswordResetAcceptedSchema>;

/** `POST /api/auth/password-reset/confirm`: the token from the e-mailed link and the new password. */
export const PasswordResetConfirmSchema = z.strictObject({
  token: z
    .string()
    .min(20, 'The reset link is incomplete; open it again from the e-mail.')
    .max(200),
  password: PasswordSchema,
});
/** A reset confirmation. */
export type PasswordResetConfirm = z.infer<typeof PasswordResetConfirmSchema>;

/** Name of the cookie holding the CSRF token and of the header that must echo it (Angular's defaults). */
export const XSRF_COOKIE = 'XSRF-TOKEN';
/** The header a mutating request carries with the `XSRF-TOKEN` cookie's value. */
export const XSRF_HEADER = 'X-XSRF-TOKEN';
