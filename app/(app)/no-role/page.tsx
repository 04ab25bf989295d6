import { PageHeader } from "@/components/ui/page-header";
import { Notice } from "@/components/ui/notice";
import { pageActor } from "@/lib/auth/page";

export default async function NoRolePage() {
  await pageActor();
  return (
    <>
      <PageHeader title="No role yet" />
      <Notice>Your account holds no role on any vessel or company. Ask your company administrator to give you one.</Notice>
    </>
  );
}
