import type { Metadata } from "next";
import { VesselForm } from "@/components/admin/vessel-form";
import { PageHeader } from "@/components/ui/page-header";
import { authorizeOrg } from "@/lib/auth/authorize";
import { pageActor, pageAuthorize } from "@/lib/auth/page";
import { createVesselAction } from "../../actions";

export const metadata: Metadata = { title: "New vessel" };

export default async function NewVesselPage() {
  const actor = await pageActor();
  await pageAuthorize(() => authorizeOrg({ actor, allow: ["admin"] }));
  return (
    <>
      <PageHeader title="New vessel" />
      <div className="rounded-lg border border-slate-200 bg-white p-4">
        <VesselForm action={createVesselAction} />
      </div>
    </>
  );
}
