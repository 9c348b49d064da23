import { z } from "zod";
import { PASSWORD_MAX_LENGTH as PASSWORD_MAX, PASSWORD_MIN_LENGTH as PASSWORD_MIN } from "@/lib/auth/constants";

// One schema per write, shared by the form (zodResolver) and the route handler.
export const personName = z
  .string({ error: "Enter a name." })
  .trim()
  .min(2, "Enter a name of at least 2 characters.")
  .max(100, "Keep the name under 100 characters.");

export const emailAddress = z
  .string({ error: "Enter an e-mail address." })
  .trim()
  .toLowerCase()
  .min(1, "Enter an e-mail address.")
  .max(254, "That e-mail address is too long.")
  .pipe(z.email("Enter a valid e-mail address, like name@example.com."));

export const inviteTherapistSchema = z.object({ name: personName, email: emailAddress });
export type InviteTherapistInput = z.input<typeof inviteTherapistSchema>;

export const inviteClientSchema = z.object({ fullName: personName, email: emailAddress });
export type InviteClientInput = z.input<typeof inviteClientSchema>;

export const carerRelationship = z
  .string({ error: "Say how this person is related to the client." })
  .trim()
  .min(2, "Say how this person is related to the client, for example 'daughter' or 'support worker'.")
  .max(60, "Keep the relationship under 60 characters.");

export const inviteCarerSchema = z.object({
  carerName: personName,
  carerEmail: emailAddress,
  relationship: carerRelationship,
  // A client's own request is in-app consent; a therapist records how the client gave it.
  consentMethod: z.enum(["in-app", "verbal", "written"], { error: "Choose how the client gave consent." }),
  consentNote: z.string().trim().max(500, "Keep the note under 500 characters.").optional(),
  consentConfirmed: z.literal(true, { error: "Tick the box to confirm consent to this carer." }),
});
export type InviteCarerInput = z.input<typeof inviteCarerSchema>;

export const password = z
  .string({ error: "Choose a password." })
  .min(PASSWORD_MIN, `Use at least ${PASSWORD_MIN} characters.`)
  .max(PASSWORD_MAX, `Use at most ${PASSWORD_MAX} characters.`);

export const acceptInvitationSchema = z
  .object({ name: personName, password, confirmPassword: z.string({ error: "Type the password again." }) })
  .refine((value) => value.password === value.confirmPassword, {
    path: ["confirmPassword"],
    message: "The two passwords are not the same.",
  });
export type AcceptInvitationInput = z.input<typeof acceptInvitationSchema>;

export const resetPasswordSchema = z
  .object({ password, confirmPassword: z.string({ error: "Type the password again." }) })
  .refine((value) => value.password === value.confirmPassword, {
    path: ["confirmPassword"],
    message: "The two passwords are not the same.",
  });

export const signInSchema = z.object({
  email: emailAddress,
  password: z.string({ error: "Enter your password." }).min(1, "Enter your password."),
});

export const forgotPasswordSchema = z.object({ email: emailAddress });
