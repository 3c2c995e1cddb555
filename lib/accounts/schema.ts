import { z } from "zod";
import { ROLES } from "@/lib/roles";
import { PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH } from "@/lib/password-policy";
import { nextPathProblem } from "@/lib/paths";

// Input schemas of the account flows. The same schema validates the form
// (server action, FormData strings) and the JSON route, so both give the
// same field messages. E-mails are trimmed and lower-cased before checking.
export const emailField = z
  .string({ error: "Enter your e-mail address." })
  .trim()
  .toLowerCase()
  .pipe(z.email({ error: "Enter a valid e-mail address." }).max(254, { error: "That e-mail address is too long." }));

export const newPasswordField = z
  .string({ error: "Choose a password." })
  .min(PASSWORD_MIN_LENGTH, { error: `Use at least ${PASSWORD_MIN_LENGTH} characters.` })
  .max(PASSWORD_MAX_LENGTH, { error: `Use at most ${PASSWORD_MAX_LENGTH} characters.` });

const enteredPassword = z
  .string({ error: "Enter your password." })
  .min(1, { error: "Enter your password." })
  .max(PASSWORD_MAX_LENGTH, { error: "E-mail or password is wrong." });

// Names end up in mail subjects, page titles and the activity log: no line
// breaks, control characters, or the bidirectional overrides that make text
// read differently from what it is.
const UNPRINTABLE = /[\p{Cc}\u2028\u2029\u200e\u200f\u202a-\u202e\u2066-\u2069]/u;
const NAME_CHARACTERS = "Use letters, digits, spaces and punctuation only (no line breaks or control characters).";

function nameField(missing: string) {
  return z
    .string({ error: missing })
    .refine((v) => !UNPRINTABLE.test(v), { error: NAME_CHARACTERS })
    .transform((v) => v.trim())
    .pipe(z.string().min(1, { error: missing }).max(100, { error: "Use at most 100 characters." }));
}

const displayName = nameField("Enter your name.");

/** Where to go after signing in: printable ASCII only (a 400 otherwise); safeNextPath then keeps it on this origin. */
const nextPathField = z
  .string()
  .max(500)
  .superRefine((v, ctx) => {
    const problem = nextPathProblem(v);
    if (problem) ctx.addIssue({ code: "custom", message: problem });
  });

const token = z.string({ error: "This link is incomplete." }).trim().min(20, { error: "This link is incomplete." }).max(200, { error: "This link is not valid." });

export const signUpSchema = z.object({
  displayName,
  email: emailField,
  password: newPasswordField,
  workspaceName: nameField("Name your workspace."),
});
export type SignUpInput = z.infer<typeof signUpSchema>;

export const signInSchema = z.object({
  email: emailField,
  password: enteredPassword,
  next: nextPathField.optional(),
});

export const confirmSignUpSchema = z.object({ token });
export type SignInInput = z.infer<typeof signInSchema>;

export const forgotPasswordSchema = z.object({ email: emailField });
export type ForgotPasswordInput = z.infer<typeof forgotPasswordSchema>;

export const resetPasswordSchema = z.object({ token, password: newPasswordField });
export type ResetPasswordInput = z.infer<typeof resetPasswordSchema>;

export const describeInviteSchema = z.object({ token });

/** displayName and a new password for a new account; the account's password for an existing one. */
export const acceptInviteSchema = z.object({
  token,
  displayName: displayName.optional(),
  password: z.string().max(PASSWORD_MAX_LENGTH, { error: `Use at most ${PASSWORD_MAX_LENGTH} characters.` }).optional(),
});
export type AcceptInviteInput = z.infer<typeof acceptInviteSchema>;

export const roleField = z.enum(ROLES, { error: "Choose one of the roles." });

export const inviteSchema = z.object({ email: emailField, role: roleField });
export type InviteInput = z.infer<typeof inviteSchema>;

const recordId = z.string().min(1).max(64).regex(/^[A-Za-z0-9_-]+$/);

export const memberParams = z.object({ userId: recordId });
export const inviteParams = z.object({ inviteId: recordId });
export const changeRoleSchema = z.object({ role: roleField });
export const changeRoleFormSchema = z.object({ userId: recordId, role: roleField });
export const removeMemberFormSchema = z.object({ userId: recordId });
export const revokeInviteFormSchema = z.object({ inviteId: recordId });
export const switchWorkspaceSchema = z.object({ workspaceId: recordId });
