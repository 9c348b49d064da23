import { createAccessControl } from "better-auth/plugins/access";

// Rampline's four roles. A clinic is a better-auth organization; each person is a member with one of these roles.
export const ROLES = ["admin", "therapist", "client", "carer"] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  admin: "Clinic admin",
  therapist: "Therapist",
  client: "Client",
  carer: "Carer",
};

export function isRole(value: unknown): value is Role {
  return typeof value === "string" && (ROLES as readonly string[]).includes(value);
}

// Who may invite whom. The organization plugin's own invitation endpoints are not exposed over HTTP (see
// app/api/auth/[...all]/route.ts); Rampline's invitation commands enforce this table.
export const MAY_INVITE: Record<Role, readonly Role[]> = {
  admin: ["therapist"],
  therapist: ["client", "carer"],
  client: ["carer"],
  carer: [],
};

// Access-control statements for the organization plugin, so its server-side API agrees with the table above.
const statement = {
  organization: ["update", "delete"],
  member: ["create", "update", "delete"],
  invitation: ["create", "cancel"],
} as const;

export const accessControl = createAccessControl(statement);

export const organizationRoles = {
  admin: accessControl.newRole({
    organization: ["update"],
    member: ["create", "update", "delete"],
    invitation: ["create", "cancel"],
  }),
  therapist: accessControl.newRole({ invitation: ["create", "cancel"] }),
  client: accessControl.newRole({ invitation: ["create"] }),
  carer: accessControl.newRole({}),
};
