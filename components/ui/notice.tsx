import type { ReactNode } from "react";

type TTone = "info" | "success" | "error" | "caution";
const TONES: Record<TTone, string> = {
  info: "border-hull-600 bg-hull-100 text-hull-900",
  success: "border-green-700 bg-green-50 text-green-900",
  error: "border-red-700 bg-red-50 text-red-900",
  caution: "border-amber-600 bg-amber-50 text-amber-950",
};

export function Notice({ tone = "info", title, children }: { tone?: TTone; title?: string; children: ReactNode }) {
  return (
    <div role={tone === "error" ? "alert" : "status"} className={`rounded-md border-l-4 p-3 text-sm ${TONES[tone]}`}>
      {title ? <p className="font-semibold">{title}</p> : null}
      <div>{children}</div>
    </div>
  );
}
