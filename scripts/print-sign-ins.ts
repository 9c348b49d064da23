// Prints where Rampline is running and the demo sign-ins, straight from the seed data so they never drift apart.
import { DEMO_PASSWORD, demoAdmin, demoCarers, demoClients, demoTherapists } from "../db/seed/demo-clinic";

const [appUrl, mailUrl] = process.argv.slice(2);
const row = (role: string, email: string, note = "") => `    ${role.padEnd(14)}${email.padEnd(34)}${note}`;
const lines = [
  "",
  `  Rampline is running:     ${appUrl}`,
  `  Demo mailbox (e-mails):  ${mailUrl}`,
  `  Settings explorer:       ${appUrl}/explore`,
  "",
  `  Demo sign-ins (password for all: ${DEMO_PASSWORD})`,
  row("Clinic admin", demoAdmin.email, demoAdmin.name),
  ...demoTherapists.map((person) => row("Therapist", person.email, person.name)),
  ...demoClients.map((person) => row("Client", person.email, person.name)),
  ...demoCarers.map((person) => {
    const cared = demoClients.find((c) => c.key === person.client);
    return row("Carer", person.email, `${person.name} (for ${cared?.name})`);
  }),
  "",
  "  Press Ctrl-C to stop.",
];
console.log(lines.join("\n"));
