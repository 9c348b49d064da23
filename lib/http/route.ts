import "server-only";
import type { z } from "zod";
import type { Actor } from "@/lib/auth/actor";
import { getActorFromHeaders } from "@/lib/auth/actor";
import { requireRole } from "@/lib/auth/access";
import { ROLES, type Role } from "@/lib/auth/roles";
import { errorResponse } from "./responses";
import { readJson } from "./read-json";

type Body<S> = S extends z.ZodType ? z.output<S> : undefined;

type RouteOptions<S, P> = {
  roles: readonly Role[] | "public";
  // Record-level access (e.g. requireClientAccess), checked before the body is read so that someone outside the
  // record's circle gets its 404 rather than a validation message about a record they cannot see.
  authorize?: (context: { actor: Actor; params: P }) => Promise<unknown>;
  body?: S;
  maxBytes?: number;
  status?: number;
};

type Context<S, P, A> = { actor: A; data: Body<S>; params: P; request: Request };

// Wraps a route handler: who is asking (401 before anything else), may their role (403), may they reach this record
// (404), is the body well formed (400), then the work. Errors become the JSON shape of lib/errors.ts; nothing leaks a stack trace.
export function route<S extends z.ZodType | undefined = undefined, P = Record<string, never>>(
  options: RouteOptions<S, P> & { roles: readonly Role[] },
  handler: (context: Context<S, P, Actor>) => Promise<unknown>,
): (request: Request, context: { params: Promise<P> }) => Promise<Response>;
export function route<S extends z.ZodType | undefined = undefined, P = Record<string, never>>(
  options: Omit<RouteOptions<S, P>, "authorize"> & { roles: "public" },
  handler: (context: Context<S, P, Actor | null>) => Promise<unknown>,
): (request: Request, context: { params: Promise<P> }) => Promise<Response>;
export function route<S extends z.ZodType | undefined, P>(
  options: RouteOptions<S, P>,
  handler: (context: Context<S, P, never>) => Promise<unknown>,
) {
  return async (request: Request, context: { params: Promise<P> }) => {
    try {
      const found = await getActorFromHeaders(request.headers);
      const actor = options.roles === "public" ? found : requireRole(found, ...(options.roles.length ? options.roles : ROLES));
      const params = await context.params;
      if (options.authorize && actor) await options.authorize({ actor, params });
      const data = (options.body ? await readJson(request, options.body, options.maxBytes) : undefined) as Body<S>;
      const result = await handler({ actor: actor as never, data, params, request });
      if (result instanceof Response) return result;
      return Response.json(result ?? { ok: true }, { status: options.status ?? 200 });
    } catch (error) {
      return errorResponse(error);
    }
  };
}
