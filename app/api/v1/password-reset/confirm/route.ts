import { readJsonValue, route } from "@/lib/http/route";
import { resetPassword } from "@/lib/services/password-reset";

/**
 * Sets a new password with the token from the e-mailed link. Public: body
 * { token, password, passwordAgain }. An expired, used or unknown token: 400, nothing changed.
 */
export const POST = route(async (req) => resetPassword(await readJsonValue(req)));
