/** Sign-in and password forms: one schema each, used by the form and by the server. */
import { z } from "zod";
import * as zm from "zod/mini";

/**
 * Written with zod's small build (the same validation, a fraction of the code): the sign-in page is
 * the first a phone on site loads, and this schema is its only one.
 */
export const signInSchema = zm.object({
  email: zm.pipe(zm.string().check(zm.trim(), zm.toLowerCase()), zm.email("Enter an e-mail address")),
  password: zm.string().check(zm.minLength(1, "Enter your password"), zm.maxLength(200)),
  /** A code from the authenticator app, or a recovery code; asked for once the password is right. */
  code: zm.optional(zm.string().check(zm.trim(), zm.maxLength(20, "Enter the code"))),
});

export const PASSWORD_MIN = 10;

export const setPasswordSchema = z
  .object({
    password: z
      .string()
      .min(PASSWORD_MIN, `Use at least ${PASSWORD_MIN} characters`)
      .max(200, "Use at most 200 characters"),
    confirm: z.string(),
  })
  .refine((v) => v.password === v.confirm, { path: ["confirm"], message: "The two passwords differ" });

export type SignInInput = zm.infer<typeof signInSchema>;
export type SetPasswordInput = z.infer<typeof setPasswordSchema>;
