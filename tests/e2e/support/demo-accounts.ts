import { DEMO_PASSWORD, demoAdmin, demoCarers, demoClients, demoTherapists } from "@/db/seed/demo-clinic";

// The demo sign-ins the README lists, taken from the seed data itself so the two never drift apart.
export const demo = {
  password: DEMO_PASSWORD,
  admin: demoAdmin,
  therapist: demoTherapists[0]!,
  otherTherapist: demoTherapists[1]!,
  client: demoClients[0]!,
  carer: demoCarers[0]!,
};
