// The words the forms use, written out here rather than imported, so a change to what people read fails a test.
export const MESSAGES = {
  missingName: "Enter a name of at least 2 characters.",
  missingEmail: "Enter an e-mail address.",
  badEmail: "Enter a valid e-mail address, like name@example.com.",
  missingPassword: "Enter your password.",
  shortPassword: "Use at least 10 characters.",
  mismatch: "The two passwords are not the same.",
  missingRelationship: "Say how this person is related to the client, for example 'daughter' or 'support worker'.",
  missingConsent: "Tick the box to confirm consent to this carer.",
  taken: "That e-mail address already belongs to someone on Rampline.",
  therapistTaken: "That e-mail address already has a Rampline account.",
  usedLink: "This link has expired or has already been used.",
} as const;
