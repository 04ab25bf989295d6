import type { Metadata } from "next";
import { RatingMark } from "@/components/ui/rating-mark";
import { AcknowledgeForm } from "@/components/signing/acknowledge-form";
import { Notice } from "@/components/ui/notice";
import { PageHeader } from "@/components/ui/page-header";
import { pageActor, pageAuthorize } from "@/lib/auth/page";
import { formatDateTime } from "@/lib/format";
import { listMySharesAs } from "@/lib/services/shares";

export const metadata: Metadata = { title: "Shared reports" };

/** One card per shared report: readable on a tablet, with the rating the signed report states. */
export default async function SharedReportsPage() {
  const actor = await pageActor();
  const shares = await pageAuthorize(() => listMySharesAs(actor));
  return (
    <>
      <PageHeader title="Reports shared with you" subtitle="Countersigned ballast tank reports that a company has shared with you for class" />
      {shares.length === 0 ? (
        <Notice>No report has been shared with you yet.</Notice>
      ) : (
        <ul className="space-y-3" aria-label="Shared reports">
          {shares.map((s) => (
            <li key={s.shareId} data-testid="shared-report" className="rounded-lg border border-slate-200 bg-white p-4 shadow-sm">
              <div className="flex flex-wrap items-baseline justify-between gap-2">
                <h2 className="text-lg font-semibold text-hull-900">
                  {s.vessel} · {s.tank}
                </h2>
                {s.rating ? <RatingMark kind={s.rating} /> : <RatingMark kind="unrated" />}
              </div>
              <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm sm:grid-cols-[auto_1fr_auto_1fr]">
                <dt className="text-slate-600">Company</dt>
                <dd>{s.company}</dd>
                <dt className="text-slate-600">IMO</dt>
                <dd className="font-mono">{s.imoNumber}</dd>
                <dt className="text-slate-600">Inspected</dt>
                <dd className="whitespace-nowrap font-mono">{s.inspectedOn}</dd>
                <dt className="text-slate-600">Revision</dt>
                <dd>{s.revision}</dd>
                <dt className="text-slate-600">Shared</dt>
                <dd className="whitespace-nowrap">{formatDateTime(s.sharedAt)}</dd>
              </dl>
              <p className="mt-3 text-sm">
                <a className="font-semibold text-hull-700 underline" href={`/api/v1/shares/${s.shareId}/report`}>
                  Read the PDF
                </a>
                {s.sha256 ? <span className="mt-1 block break-all font-mono text-xs text-slate-600">SHA-256 {s.sha256}</span> : null}
              </p>
              <div className="mt-3 border-t border-slate-100 pt-3 text-sm">
                {s.acknowledgedAt ? (
                  <p>
                    <span className="font-semibold">Acknowledged {formatDateTime(s.acknowledgedAt)}</span>
                    {s.acknowledgementComment ? <span className="block">“{s.acknowledgementComment}”</span> : null}
                  </p>
                ) : (
                  <AcknowledgeForm shareId={s.shareId} />
                )}
              </div>
            </li>
          ))}
        </ul>
      )}
    </>
  );
}
