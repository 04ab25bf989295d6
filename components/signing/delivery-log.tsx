"use client";

import { useQuery } from "@tanstack/react-query";
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { postJson } from "./api";

type TDelivery = { id: string; recipient: string; status: "queued" | "sent" | "failed"; attempts: number; lastError: string | null; method: string | null; linkExpiresAt: string | null; sentAt: string | null; createdAt: string; resent: boolean };

const STATUS_TEXT = { queued: "Queued", sent: "Sent", failed: "Failed (retrying)" } as const;

export function DeliveryLog(props: { inspectionId: string; canResend: boolean }) {
  const [client] = useState(() => new QueryClient());
  return <QueryClientProvider client={client}><Log {...props} /></QueryClientProvider>;
}

/** Every e-mail that carried the signed PDF, refreshed while any is still on its way. */
function Log({ inspectionId, canResend }: { inspectionId: string; canResend: boolean }) {
  const [message, setMessage] = useState<string | null>(null);
  const q = useQuery<TDelivery[]>({
    queryKey: ["deliveries", inspectionId],
    queryFn: async () => ((await (await fetch(`/api/v1/inspections/${inspectionId}/deliveries`)).json()) as { deliveries: TDelivery[] }).deliveries,
    refetchInterval: (query) => (query.state.data?.some((d) => d.status !== "sent") ? 3000 : false),
  });
  async function resend(d: TDelivery) {
    const res = await postJson(`/api/v1/deliveries/${d.id}/resend`);
    setMessage(res.ok ? `Sending again to ${d.recipient}.` : res.message);
    await q.refetch();
  }
  if (!q.data) return <p>Loading the e-mail log…</p>;
  if (!q.data.length) return <p>No recipients are set for this vessel: the report was not e-mailed. The office adds them on the vessel page.</p>;
  return (
    <div>
      <h3 className="mt-2 font-semibold text-hull-900">E-mailed to</h3>
      {message ? <p role="status">{message}</p> : null}
      <table className="mt-1 w-full text-left text-sm">
        <thead><tr className="border-b border-slate-300"><th className="py-1 pr-2">Recipient</th><th className="pr-2">Status</th><th className="pr-2">How</th><th className="pr-2">When</th>{canResend ? <th /> : null}</tr></thead>
        <tbody>
          {q.data.map((d) => (
            <tr key={d.id} className="border-b border-slate-100" data-testid="delivery">
              <td className="py-1 pr-2">{d.recipient}</td>
              <td className="pr-2">{STATUS_TEXT[d.status]}{d.attempts > 1 ? ` · ${d.attempts} tries` : ""}{d.lastError && d.status !== "sent" ? <span className="block text-xs text-red-800">{d.lastError}</span> : null}</td>
              <td className="pr-2">{d.method === "link" ? `link until ${d.linkExpiresAt?.slice(0, 10)}` : d.method === "attachment" ? "PDF attached" : "—"}</td>
              <td className="pr-2">{(d.sentAt ?? d.createdAt).slice(0, 16).replace("T", " ")} UTC</td>
              {canResend ? <td><Button type="button" variant="secondary" className="min-h-8 px-2 py-1" onClick={() => resend(d)}>Send again</Button></td> : null}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
