import { AppError, errorBody } from "@/lib/errors";

const noStore = { "Cache-Control": "no-store" };

export function errorResponse(error: unknown): Response {
  if (error instanceof AppError) {
    return Response.json(errorBody(error), { status: error.status, headers: noStore });
  }
  console.error("[api] unexpected error:", error);
  return Response.json(
    { error: { code: "INTERNAL", message: "Something went wrong on our side. Please try again in a moment." } },
    { status: 500, headers: noStore },
  );
}
