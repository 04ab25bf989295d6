import type { Metadata } from "next";
import { AcknowledgeForm } from "@/components/signing/acknowledge-form";
import { PageHeader } from "@/components/ui/page-header";
import { Notice } from "@/components/ui/notice";
import { Cell, Table } from "@/components/ui/table";
import { listSharesForSurveyor } from "@/db/queries/shares";
import { authorizeOrg } from "@/lib/auth/authorize";
import { pageActor, pageAuthorize } from "@/lib/auth/page";
import { formatDate } from "@/lib/format";

export const metadata: Metadata = { title: "Shared reports" };

export default async function SharedReportsPage() {
  const actor = await pageActor();
  await pageAuthorize(() => authorizeOrg({ actor, allow: ["surveyor"] }));
  const shares = await listSharesForSurveyor({ surveyorUserId: actor.userId });
  return (
    <>
      <PageHeader title="Reports shared with you" subtitle="Countersigned ballast tank reports that a company has shared with you for class" />
      {shares.length === 0 ? (
        <Notice>No report has been shared with you yet.</Notice>
      ) : (
        <Table head={["Company", "Vessel", "Tank", "Inspected", "Revision", "Shared", "Signed PDF", "Acknowledged"]}>
          {shares.map((s) => (
            <tr key={s.shareId}>
              <Cell>{s.company}</Cell>
              <Cell>
                {s.vessel} <span className="font-mono text-xs text-slate-500">IMO {s.imoNumber}</span>
              </Cell>
              <Cell>{s.tank}</Cell>
              <Cell>{s.inspectedOn}</Cell>
              <Cell>{s.revision}</Cell>
              <Cell>{formatDate(s.sharedAt)}</Cell>
              <Cell>
                <a className="font-semibold underline" href={`/api/v1/shares/${s.shareId}/report`}>Read the PDF</a>
                {s.sha256 ? <span className="block break-all font-mono text-[10px] text-slate-500">SHA-256 {s.sha256}</span> : null}
              </Cell>
              <Cell>{s.acknowledgedAt ? <>{formatDate(s.acknowledgedAt)}{s.acknowledgementComment ? <span className="block text-xs">“{s.acknowledgementComment}”</span> : null}</> : <AcknowledgeForm shareId={s.shareId} />}</Cell>
            </tr>
          ))}
        </Table>
      )}
    </>
  );
}
