import { readJsonValue, route } from "@/lib/http/route";
import { requestPasswordReset } from "@/lib/services/password-reset";

/**
 * "Forgot your password?" Public: body { email }. Always the same answer, whether
 * or not the address has an account; the link goes out by e-mail if it does.
 */
export const POST = route(async (req) => requestPasswordReset(await readJsonValue(req)));
