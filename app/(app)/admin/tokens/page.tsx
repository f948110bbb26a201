import type { Metadata } from "next";
import { requirePermission } from "@/lib/auth/guard";
import { grantableScopes, listApiTokens, TOKEN_REQUESTS_PER_MINUTE } from "@/lib/api-tokens/service";
import { ROLE_LABELS } from "@/lib/users/schemas";
import { AdminTabs } from "../admin-tabs";
import { CreateTokenForm } from "./create-token-form";
import { RevokeButton } from "./revoke-button";
import { ukDateTime } from "@/lib/dates";

export const metadata: Metadata = { title: "API tokens" };

const when = (d: Date | null) => ukDateTime(d);

export default async function TokensPage() {
  const actor = await requirePermission("api-tokens:manage");
  const tokens = await listApiTokens(actor);
  return (
    <div className="space-y-6">
      <h1 className="text-2xl font-bold">Organisation</h1>
      <AdminTabs current="/admin/tokens" />
      <p className="text-sm text-muted">
        A token lets another system use the API (<code>/api/v1</code>) for your organisation, sent as{" "}
        <code>Authorization: Bearer …</code>. It acts for the person who created it, with the permissions of the scope
        chosen and never more than theirs; it cannot open the app&apos;s pages or sign anything. Each token may make{" "}
        {TOKEN_REQUESTS_PER_MINUTE} requests a minute.
      </p>
      <CreateTokenForm scopes={grantableScopes(actor.role).map((r) => ({ value: r, label: ROLE_LABELS[r] }))} />
      <div className="overflow-x-auto rounded-lg border border-rule bg-white">
        <table className="w-full text-left text-sm">
          <thead className="bg-paper">
            <tr>
              <th className="px-3 py-2">Name</th>
              <th className="px-3 py-2">Starts</th>
              <th className="px-3 py-2">Scope</th>
              <th className="px-3 py-2">Created</th>
              <th className="px-3 py-2">Expires</th>
              <th className="px-3 py-2">Last used</th>
              <th className="px-3 py-2">State</th>
            </tr>
          </thead>
          <tbody>
            {tokens.length === 0 && (
              <tr>
                <td colSpan={7} className="px-3 py-4 text-muted">
                  No tokens yet.
                </td>
              </tr>
            )}
            {tokens.map((t) => (
              <tr key={t.id} className="border-t border-rule" data-testid={`token-${t.name}`}>
                <td className="px-3 py-2 font-bold">{t.name}</td>
                <td className="px-3 py-2 font-mono">{t.prefix}…</td>
                <td className="px-3 py-2">{ROLE_LABELS[t.scope]}</td>
                <td className="px-3 py-2">
                  {when(t.createdAt)} by {t.createdBy}
                </td>
                <td className="px-3 py-2">{when(t.expiresAt)}</td>
                <td className="px-3 py-2">{when(t.lastUsedAt)}</td>
                <td className="px-3 py-2">
                  {t.state === "active" ? (
                    <RevokeButton tokenId={t.id} name={t.name} />
                  ) : t.state === "revoked" ? (
                    "Revoked"
                  ) : (
                    "Expired"
                  )}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
