"use client";

import { FormMessage, PrimaryButton, SelectField, TextField } from "@/app/_components/form";
import { useActionForm } from "@/app/_components/use-action-form";
import { ROLES } from "@/db/schema";
import type { OrganisationSettings } from "@/lib/organisations/service";
import {
  organisationSettingsSchema,
  REVIEW_PERIODS,
  REVIEW_REMINDER_PRESETS,
  type OrganisationSettingsInput,
} from "@/lib/organisations/schemas";
import { ROLE_LABELS } from "@/lib/users/schemas";
import { saveSettingsAction } from "./actions";

export function SettingsForm({ settings }: { settings: OrganisationSettings }) {
  const { register, onSubmit, formState, outcome } = useActionForm<OrganisationSettingsInput>(
    organisationSettingsSchema,
    saveSettingsAction,
    {
      defaultValues: {
        name: settings.name,
        reviewPeriodMonths: settings.reviewPeriodMonths,
        secondFactorRoles: settings.secondFactorRoles,
        reviewReminders: settings.reviewReminders as OrganisationSettingsInput["reviewReminders"],
        approvalReminderDays: settings.approvalReminderDays,
      },
    },
  );
  return (
    <form
      onSubmit={onSubmit}
      noValidate
      className="space-y-4 rounded-lg border border-rule bg-white p-4"
      aria-labelledby="settings-heading"
    >
      <h2 id="settings-heading" className="text-lg font-bold">
        Settings
      </h2>
      {outcome && <FormMessage tone={outcome.tone}>{outcome.text}</FormMessage>}
      <div className="grid gap-3 md:grid-cols-2">
        <TextField
          label="Organisation name"
          hint="Printed on packs and in e-mails."
          error={formState.errors.name?.message}
          {...register("name")}
        />
        <SelectField
          label="Default review period (suggested at submission)"
          error={formState.errors.reviewPeriodMonths?.message}
          {...register("reviewPeriodMonths")}
        >
          {REVIEW_PERIODS.map((m) => (
            <option key={m} value={m}>
              {m === 1 ? "1 month" : m === 12 ? "12 months (1 year)" : m === 24 ? "24 months (2 years)" : `${m} months`}
            </option>
          ))}
        </SelectField>
      </div>
      <div className="grid gap-3 md:grid-cols-2">
        <SelectField
          label="Review reminders (to the author and administrators)"
          error={formState.errors.reviewReminders?.message}
          {...register("reviewReminders")}
        >
          {Object.entries(REVIEW_REMINDER_PRESETS).map(([value, label]) => (
            <option key={value} value={value}>
              {label}, and once overdue
            </option>
          ))}
        </SelectField>
        <TextField
          label="Remind an approver after (days waiting)"
          type="number"
          inputMode="numeric"
          min={1}
          max={30}
          error={formState.errors.approvalReminderDays?.message}
          {...register("approvalReminderDays")}
        />
      </div>
      <fieldset>
        <legend className="font-bold">Second factor required for</legend>
        <p className="text-sm text-muted">
          People in these roles must set up an authenticator app; until they do, they can only reach their account page.
          Approvers, who countersign, and administrators are the usual choice.
        </p>
        <div className="mt-2 flex flex-wrap gap-4">
          {ROLES.map((role) => (
            <label key={role} className="flex items-center gap-2">
              <input type="checkbox" value={role} className="h-5 w-5" {...register("secondFactorRoles")} />
              {ROLE_LABELS[role]}
            </label>
          ))}
        </div>
        {formState.errors.secondFactorRoles && (
          <p className="text-sm font-bold text-danger">{formState.errors.secondFactorRoles.message}</p>
        )}
      </fieldset>
      <PrimaryButton type="submit" disabled={formState.isSubmitting}>
        {formState.isSubmitting ? "Saving…" : "Save settings"}
      </PrimaryButton>
    </form>
  );
}
