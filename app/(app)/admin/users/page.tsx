import type { Metadata } from "next";
import { requirePermission } from "@/lib/auth/guard";
import { ROLE_LABELS } from "@/lib/users/schemas";
import { listUsers } from "@/lib/users/service";
import { InviteForm } from "./invite-form";
import { UserControls } from "./user-controls";

export const metadata: Metadata = { title: "People" };

export default async function UsersPage() {
  const actor = await requirePermission("users:manage");
  const people = await listUsers(actor);
  return (
    <div className="space-y-6">
      <h1 className="text-2xl font-bold">People</h1>
      <InviteForm />
      <div className="overflow-x-auto rounded-lg border border-rule bg-white">
        <table className="w-full text-left text-sm">
          <thead className="bg-paper">
            <tr>
              <th className="px-3 py-2">Name</th>
              <th className="px-3 py-2">E-mail</th>
              <th className="px-3 py-2">Role</th>
              <th className="px-3 py-2">Status</th>
              <th className="px-3 py-2">Change</th>
            </tr>
          </thead>
          <tbody>
            {people.map((person) => (
              <tr key={person.id} className="border-t border-rule" data-testid={`person-${person.email}`}>
                <td className="px-3 py-2 font-bold">{person.name}</td>
                <td className="px-3 py-2">{person.email}</td>
                <td className="px-3 py-2">{ROLE_LABELS[person.role]}</td>
                <td className="px-3 py-2">
                  {!person.active ? "Deactivated" : person.pending ? "Invited, no password yet" : "Active"}
                </td>
                <td className="px-3 py-2">
                  <UserControls user={person} isSelf={person.id === actor.id} />
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
