// The state a form's server action returns (shared by server and client code).
export type TActionState =
  | { status: "idle" }
  | { status: "ok"; message: string }
  | { status: "error"; message: string; fieldErrors: Record<string, string>; values: Record<string, string> };

export const IDLE_STATE: TActionState = { status: "idle" };
