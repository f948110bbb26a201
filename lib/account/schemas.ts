/** Account forms: one schema each, used by the form and by the server. */
import { z } from "zod";
import { PASSWORD_MIN, setPasswordSchema } from "@/lib/auth/schemas";

const email = z.string().trim().toLowerCase().pipe(z.email("Enter a valid e-mail address"));
const personName = z.string().trim().min(2, "Enter your name").max(120, "Use at most 120 characters");
const newPassword = z
  .string()
  .min(PASSWORD_MIN, `Use at least ${PASSWORD_MIN} characters`)
  .max(200, "Use at most 200 characters");

export const profileSchema = z.object({ name: personName });

export const changePasswordSchema = z
  .object({
    current: z.string().min(1, "Enter your current password").max(200),
    password: newPassword,
    confirm: z.string(),
  })
  .refine((v) => v.password === v.confirm, { path: ["confirm"], message: "The two passwords differ" })
  .refine((v) => v.password !== v.current, { path: ["password"], message: "Choose a password you have not used here" });

export const forgotPasswordSchema = z.object({ email });

/** The reset form: a new password, twice. */
export const resetPasswordSchema = setPasswordSchema;

export const signUpSchema = z
  .object({
    organisation: z.string().trim().min(2, "Enter your organisation's name").max(120, "Use at most 120 characters"),
    name: personName,
    email,
    password: newPassword,
    confirm: z.string(),
  })
  .refine((v) => v.password === v.confirm, { path: ["confirm"], message: "The two passwords differ" });

/** A six-digit code from the authenticator app. */
export const totpCodeSchema = z.object({
  code: z
    .string()
    .trim()
    .transform((c) => c.replace(/\s/g, ""))
    .pipe(z.string().regex(/^\d{6}$/, "Enter the six digits the app shows")),
});

/** Turning the second factor off, or making new recovery codes: the password again. */
export const confirmPasswordSchema = z.object({ password: z.string().min(1, "Enter your password").max(200) });

/** The password and a code from the app (or a recovery code): for changes to the second factor itself. */
export const confirmWithCodeSchema = confirmPasswordSchema.extend({
  code: z.string().trim().min(1, "Enter a code from your app, or a recovery code").max(20),
});

export type ProfileInput = z.infer<typeof profileSchema>;
export type ChangePasswordInput = z.infer<typeof changePasswordSchema>;
export type ForgotPasswordInput = z.infer<typeof forgotPasswordSchema>;
export type SignUpInput = z.infer<typeof signUpSchema>;
export type TotpCodeInput = z.input<typeof totpCodeSchema>;
export type ConfirmPasswordInput = z.infer<typeof confirmPasswordSchema>;
export type ConfirmWithCodeInput = z.infer<typeof confirmWithCodeSchema>;
