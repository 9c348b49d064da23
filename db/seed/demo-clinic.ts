// Invented demo data: the clinic, its place and every person here are made up.
export const DEMO_PASSWORD = "rampline-demo";

export const demoClinic = { id: "demo-clinic-larkmoor", name: "Larkmoor Community Neuro-Rehab", slug: "larkmoor" };

export type DemoPerson = { key: string; name: string; email: string };

export const demoAdmin: DemoPerson = { key: "admin", name: "Joanna Pell", email: "joanna.pell@larkmoor.example" };

export const demoTherapists: DemoPerson[] = [
  { key: "priya", name: "Priya Raman", email: "priya.raman@larkmoor.example" },
  { key: "owen", name: "Owen Castell", email: "owen.castell@larkmoor.example" },
];

export const demoClients: (DemoPerson & { therapist: string })[] = [
  { key: "arthur", name: "Arthur Mensah", email: "arthur.mensah@example.net", therapist: "priya" },
  { key: "brenda", name: "Brenda Kowalczyk", email: "brenda.k@example.net", therapist: "priya" },
  { key: "callum", name: "Callum Reid", email: "callum.reid@example.net", therapist: "owen" },
  { key: "deepa", name: "Deepa Sharma", email: "deepa.sharma@example.net", therapist: "owen" },
];

export const demoCarers: (DemoPerson & { client: string; relationship: string })[] = [
  { key: "grace", name: "Grace Mensah", email: "grace.mensah@example.net", client: "arthur", relationship: "Daughter" },
  { key: "ian", name: "Ian Reid", email: "ian.reid@example.net", client: "callum", relationship: "Brother" },
];
