import { auth } from "@/lib/auth/server";
import { acceptInvitation } from "@/lib/invitations/accept";
import { acceptInvitationSchema } from "@/lib/invitations/schemas";
import { route } from "@/lib/http/route";

// Public: the long random id in the link is what admits the person. On success they are signed in straight away.
export const POST = route<typeof acceptInvitationSchema, { invitationId: string }>(
  { roles: "public", body: acceptInvitationSchema },
  async ({ data, params, request }) => {
    const accepted = await acceptInvitation(params.invitationId, data);
    const signIn = await auth.api.signInEmail({
      body: { email: accepted.email, password: data.password },
      headers: request.headers,
      asResponse: true,
    });
    const response = Response.json({ role: accepted.role }, { status: 201 });
    for (const cookie of signIn.headers.getSetCookie()) response.headers.append("Set-Cookie", cookie);
    return response;
  },
);
