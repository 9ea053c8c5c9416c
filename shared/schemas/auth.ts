import { z } from 'zod'

/** Minimum password length for new accounts. */
export const PASSWORD_MIN_LENGTH = 12

const email = z.string().trim().toLowerCase().pipe(z.email({ message: 'Enter a valid e-mail address.' }))

/** Sign-up form and route body: guards account creation. */
export const signUpSchema = z.object({
  email,
  name: z.string().trim().min(1, 'Enter your name.').max(120, 'Name is too long (120 characters at most).'),
  password: z.string()
    .min(PASSWORD_MIN_LENGTH, `Password must be at least ${PASSWORD_MIN_LENGTH} characters.`)
    .max(256, 'Password is too long (256 characters at most).'),
})

/** Sign-in form and route body. */
export const signInSchema = z.object({
  email,
  password: z.string().min(1, 'Enter your password.').max(256, 'Password is too long.'),
})

export type SignUpInput = z.infer<typeof signUpSchema>
export type SignInInput = z.infer<typeof signInSchema>

const newPassword = z.string()
  .min(PASSWORD_MIN_LENGTH, `Password must be at least ${PASSWORD_MIN_LENGTH} characters.`)
  .max(256, 'Password is too long (256 characters at most).')

/** Password change on the account page: the current password, then a new one under the sign-up rules. */
export const passwordChangeSchema = z.object({
  currentPassword: z.string().min(1, 'Enter your current password.').max(256, 'Password is too long.'),
  newPassword,
})

/** "Forgot your password?": the address to send a reset link to. */
export const passwordResetRequestSchema = z.object({ email })

/** A reset link's token: 32 random bytes, URL-safe base64. */
export const passwordResetTokenSchema = z.string().regex(/^[A-Za-z0-9_-]{43}$/, 'This reset link is incomplete; copy all of it from the e-mail.')

/** Setting a new password from a reset link. */
export const passwordResetSchema = z.object({ token: passwordResetTokenSchema, password: newPassword })

export type PasswordChangeInput = z.infer<typeof passwordChangeSchema>
