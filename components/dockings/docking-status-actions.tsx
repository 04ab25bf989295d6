"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import type { TDockingStatus } from "@/lib/vocabulary";

const ACTIONS: Record<TDockingStatus, { to: TDockingStatus; label: string; confirm?: string; variant?: "primary" | "secondary" | "danger" }[]> = {
  planned: [
    { to: "in_progress", label: "Start the docking" },
    { to: "cancelled", label: "Cancel the docking", confirm: "Cancel this docking? Its work list can no longer be changed.", variant: "danger" },
  ],
  in_progress: [
    { to: "completed", label: "Complete the docking", confirm: "Complete this docking? Its work list can no longer be changed." },
    { to: "cancelled", label: "Cancel the docking", confirm: "Cancel this docking? Its work list can no longer be changed.", variant: "danger" },
  ],
  completed: [],
  cancelled: [],
};

/** Starts, completes or cancels the docking, then shows the page again. */
export function DockingStatusActions({ dockingId, status }: { dockingId: string; status: TDockingStatus }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function change(to: TDockingStatus, confirm?: string) {
    if (confirm && !window.confirm(confirm)) return;
    setBusy(true);
    setError(null);
    try {
      const res = await fetch(`/api/v1/dockings/${dockingId}/status`, { method: "PUT", headers: { "content-type": "application/json" }, body: JSON.stringify({ status: to }) });
      if (!res.ok) return setError(((await res.json().catch(() => ({}))) as { error?: { message?: string } }).error?.message ?? "The status could not be changed.");
      router.refresh();
    } catch {
      setError("The server could not be reached; nothing was changed. Try again.");
    } finally {
      setBusy(false);
    }
  }

  if (!ACTIONS[status].length) return null;
  return (
    <div className="space-y-2">
      {error ? <Notice tone="error">{error}</Notice> : null}
      <div className="flex flex-wrap gap-2">
        {ACTIONS[status].map((a) => (
          <Button key={a.to} variant={a.variant ?? "primary"} disabled={busy} onClick={() => change(a.to, a.confirm)}>{a.label}</Button>
        ))}
      </div>
    </div>
  );
}
