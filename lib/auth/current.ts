import "server-only";
import { headers } from "next/headers";
import { cache } from "react";
import { getActorFromHeaders } from "./actor";

// One lookup per request, however many components ask.
export const getCurrentActor = cache(async () => getActorFromHeaders(await headers()));
