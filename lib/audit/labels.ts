// Plain words for the audit trail's actions; unknown actions are shown as recorded.
const LABELS: Record<string, string> = {
  "invitation.created": "Invitation sent",
  "invitation.accepted": "Invitation accepted",
  "client.created": "Client record created",
  "client.details-changed": "Clinical summary changed",
  "carer.consent-recorded": "Carer linked with consent",
  "consent.given": "Consent given",
  "consent.withdrawn": "Consent withdrawn",
  "screening.signed": "Screening signed",
  "screening.red-flag-cleared": "Red flag cleared",
  "programme.published": "Programme version published",
  "photo.uploaded": "Photo added",
  "therapist.deactivated": "Therapist deactivated",
  "therapist.reactivated": "Therapist reactivated",
};

export function auditActionLabel(action: string): string {
  return LABELS[action] ?? action;
}

// before/after as "field: old → new" lines, for values the trail stores as JSON.
export function auditChanges(before: unknown, after: unknown): string[] {
  const b = (before && typeof before === "object" ? before : {}) as Record<string, unknown>;
  const a = (after && typeof after === "object" ? after : {}) as Record<string, unknown>;
  const keys = [...new Set([...Object.keys(b), ...Object.keys(a)])];
  const show = (value: unknown) => (value === undefined || value === null ? "—" : typeof value === "string" ? value : JSON.stringify(value));
  return keys.map((key) => (key in b ? `${key}: ${show(b[key])} → ${show(a[key])}` : `${key}: ${show(a[key])}`));
}
