import type { Metadata } from "next";
import { requirePermission } from "@/lib/auth/guard";
import { getOrganisationSettings } from "@/lib/organisations/service";
import { AdminTabs } from "../admin-tabs";
import { LogoForm } from "./logo-form";
import { SettingsForm } from "./settings-form";

export const metadata: Metadata = { title: "Organisation settings" };

export default async function OrganisationPage() {
  const actor = await requirePermission("organisation:manage");
  const settings = await getOrganisationSettings(actor);
  return (
    <div className="space-y-6">
      <h1 className="text-2xl font-bold">Organisation</h1>
      <AdminTabs current="/admin/organisation" />
      <SettingsForm settings={settings} />
      <LogoForm hasLogo={settings.hasLogo} />
    </div>
  );
}
