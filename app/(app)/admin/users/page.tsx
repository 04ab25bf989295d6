import type { Metadata } from "next";
import { GrantRoleForm, RevokeRoleButton } from "@/components/admin/role-forms";
import { UserForm } from "@/components/admin/user-form";
import { PageHeader } from "@/components/ui/page-header";
import { Cell, Table } from "@/components/ui/table";
import { listVessels } from "@/db/queries/vessels";
import { authorizeOrg } from "@/lib/auth/authorize";
import { pageActor, pageAuthorize } from "@/lib/auth/page";
import { listUsersAs } from "@/lib/services/users";
import { ROLE_LABELS } from "@/lib/vocabulary";
import { createUserAction, grantRoleAction, revokeRoleAction } from "../actions";

export const metadata: Metadata = { title: "Users and roles" };

export default async function AdminUsersPage() {
  const actor = await pageActor();
  const { orgId } = await pageAuthorize(() => authorizeOrg({ actor, allow: ["admin"] }));
  const [users, vessels] = await Promise.all([listUsersAs(actor), listVessels({ orgId })]);
  const vesselOptions = vessels.map((v) => ({ id: v.id, name: v.name }));
  return (
    <>
      <PageHeader title="Users and roles" subtitle={`${users.length} people hold roles in this company`} />
      <Table head={["Name", "E-mail", "Roles", "Grant another role"]} caption="Users">
        {users.map((u) => (
          <tr key={u.id}>
            <Cell>
              <span className="font-semibold">{u.name}</span>
              {u.rank ? <span className="block text-xs text-slate-600">{u.rank}</span> : null}
            </Cell>
            <Cell>{u.email}</Cell>
            <Cell>
              <ul>
                {u.roles.map((r) => {
                  const label = `${ROLE_LABELS[r.role]}${r.vesselName ? ` · ${r.vesselName}` : ""}`;
                  return (
                    <li key={r.membershipId}>
                      {label}
                      <RevokeRoleButton action={revokeRoleAction} membershipId={r.membershipId} label={label} />
                    </li>
                  );
                })}
              </ul>
            </Cell>
            <Cell className="min-w-80">
              <GrantRoleForm action={grantRoleAction} userId={u.id} vessels={vesselOptions} />
            </Cell>
          </tr>
        ))}
      </Table>
      <section className="mt-8 rounded-lg border border-slate-200 bg-white p-4" aria-labelledby="new-user">
        <h2 id="new-user" className="mb-4 text-lg font-semibold text-hull-900">
          New user
        </h2>
        <UserForm action={createUserAction} vessels={vesselOptions} />
      </section>
    </>
  );
}
