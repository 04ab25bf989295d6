import type { Metadata } from "next";
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
        <Table head={["Company", "Vessel", "Tank", "Inspected", "Revision", "Shared", "Acknowledged"]}>
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
              <Cell>{s.acknowledgedAt ? formatDate(s.acknowledgedAt) : "not yet"}</Cell>
            </tr>
          ))}
        </Table>
      )}
    </>
  );
}
