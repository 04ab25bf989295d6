import type { Metadata } from "next";
import Link from "next/link";
import { DockingList } from "@/components/dockings/docking-list";
import { Notice } from "@/components/ui/notice";
import { PageHeader } from "@/components/ui/page-header";
import { pageActor, pageAuthorize } from "@/lib/auth/page";
import { listDockingsAs } from "@/lib/services/dockings";

export const metadata: Metadata = { title: "Dockings" };

export default async function DockingsPage({ params }: { params: Promise<{ vesselId: string }> }) {
  const { vesselId } = await params;
  const actor = await pageActor();
  const { vessel, dockings } = await pageAuthorize(() => listDockingsAs(actor, vesselId));
  return (
    <>
      <PageHeader
        title="Dockings"
        subtitle={<Link href={`/vessels/${vesselId}`} className="underline">{vessel.name}</Link>}
        actions={<Link href={`/vessels/${vesselId}/dockings/new`} className="rounded-md bg-hull-700 px-3 py-2 text-sm font-semibold text-white hover:bg-hull-800">Plan a docking</Link>}
      />
      {dockings.length ? <DockingList dockings={dockings} /> : <Notice>No docking planned for this vessel yet.</Notice>}
    </>
  );
}
