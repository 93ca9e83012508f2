import NextAuth from "next-auth";
import { authOptions } from "@/lib/auth/options";
import { errorResponse } from "@/lib/api/handler";
import { refuseForeignOrigin } from "@/lib/api/request-guards";

const handler = NextAuth(authOptions);

type Ctx = { params: Promise<{ nextauth: string[] }> };

/** Sign-in and sign-out posts pass the same origin check as every other state-changing request. */
async function post(request: Request, context: Ctx): Promise<Response> {
  try {
    refuseForeignOrigin(request);
  } catch (err) {
    return errorResponse(err);
  }
  return handler(request, context);
}

export { handler as GET, post as POST };
