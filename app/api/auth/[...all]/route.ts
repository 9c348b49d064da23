import { toNextJsHandler } from "better-auth/next-js";
import { auth } from "@/lib/auth/server";

const handlers = toNextJsHandler(auth);

// Only the endpoints Rampline's screens use are reachable over HTTP. Sign-up, the organization plugin's own
// invitation and membership endpoints and the admin plugin's endpoints stay server-side, behind Rampline's commands
// and their role checks.
const OPEN_ENDPOINTS: Record<string, RegExp[]> = {
  GET: [/^\/get-session$/, /^\/ok$/],
  POST: [/^\/sign-in\/email$/, /^\/sign-out$/, /^\/request-password-reset$/, /^\/reset-password$/],
};

function allowed(request: Request): boolean {
  const path = new URL(request.url).pathname.replace(/^\/api\/auth/, "");
  return (OPEN_ENDPOINTS[request.method] ?? []).some((pattern) => pattern.test(path));
}

const notFound = () =>
  Response.json({ error: { code: "NOT_FOUND", message: "There is nothing here." } }, { status: 404 });

export async function GET(request: Request) {
  return allowed(request) ? handlers.GET(request) : notFound();
}

export async function POST(request: Request) {
  return allowed(request) ? handlers.POST(request) : notFound();
}
