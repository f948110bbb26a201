/**
 * Organisations: creating one with its first administrator (sign-up and `npm run org:create`), and
 * the settings its administrators choose — name, the pack cover's logo, the review period the submit
 * step suggests, and which roles must sign in with a second factor.
 */
import { eq } from "drizzle-orm";
import { getDb, type Tx } from "@/db/client";
import { organisations, users, type Role } from "@/db/schema";
import { recordAudit } from "@/lib/audit";
import { cachedRead, readKey } from "@/lib/read-cache";
import { AppError, isUniqueViolation, parseOrThrow } from "@/lib/errors";
import { requireFileType } from "@/lib/files";
import { authorize, type Actor } from "@/lib/permissions";
import { forgetSessions } from "@/lib/auth/session-cache";
import { LOGO_MAX_BYTES, LOGO_TYPES, organisationSettingsSchema } from "./schemas";

export interface NewOrganisation {
  organisation: string;
  name: string;
  email: string;
  passwordHash: string | null;
  /** The operator vouches for the address (command line); a sign-up proves it by a link. */
  verified: boolean;
}

/** The organisation and its first administrator, in the caller's transaction. An address already in use is a 409 on `email`. */
export async function createOrganisation(tx: Tx, input: NewOrganisation) {
  const [org] = await tx.insert(organisations).values({ name: input.organisation }).returning();
  const [admin] = await tx
    .insert(users)
    .values({
      organisationId: org.id,
      email: input.email,
      name: input.name,
      role: "admin",
      passwordHash: input.passwordHash,
      emailVerifiedAt: input.verified ? new Date() : null,
    })
    .returning()
    .catch((err) => {
      if (isUniqueViolation(err))
        throw new AppError("conflict", "Some fields need attention", [
          { path: "email", message: "This address already has a Heftwise account" },
        ]);
      throw err;
    });
  await recordAudit(tx, {
    organisationId: org.id,
    actorId: admin.id,
    action: "organisation.created",
    entityType: "organisation",
    entityId: org.id,
    details: { name: org.name, admin: admin.email, via: input.verified ? "command line" : "sign-up" },
  });
  return { organisation: org, admin };
}

export interface OrganisationSettings {
  name: string;
  reviewPeriodMonths: number;
  secondFactorRoles: Role[];
  /** A key of REVIEW_REMINDER_PRESETS, e.g. "30,7". */
  reviewReminders: string;
  approvalReminderDays: number;
  hasLogo: boolean;
}

export async function getOrganisationSettings(actor: Actor | null): Promise<OrganisationSettings> {
  authorize(actor, "profile:read");
  return cachedRead(readKey("organisation-settings", actor.organisationId), async () => {
    const db = await getDb();
    const [org] = await db
      .select({
        name: organisations.name,
        reviewPeriodMonths: organisations.reviewPeriodMonths,
        secondFactorRoles: organisations.secondFactorRoles,
        reviewReminderDays: organisations.reviewReminderDays,
        approvalReminderDays: organisations.approvalReminderDays,
        logoType: organisations.logoType,
      })
      .from(organisations)
      .where(eq(organisations.id, actor.organisationId));
    return {
      name: org.name,
      reviewPeriodMonths: org.reviewPeriodMonths,
      secondFactorRoles: org.secondFactorRoles,
      reviewReminders: org.reviewReminderDays.join(","),
      approvalReminderDays: org.approvalReminderDays,
      hasLogo: !!org.logoType,
    };
  });
}

export async function updateOrganisationSettings(actor: Actor | null, input: unknown): Promise<void> {
  authorize(actor, "organisation:manage");
  const data = parseOrThrow(organisationSettingsSchema, input);
  const before = await getOrganisationSettings(actor);
  const db = await getDb();
  await db.transaction(async (tx) => {
    const { reviewReminders, ...rest } = data;
    await tx
      .update(organisations)
      .set({
        ...rest,
        secondFactorRoles: [...new Set(data.secondFactorRoles)],
        reviewReminderDays: reviewReminders.split(",").map(Number),
        updatedAt: new Date(),
      })
      .where(eq(organisations.id, actor.organisationId));
    await recordAudit(tx, {
      organisationId: actor.organisationId,
      actorId: actor.id,
      action: "organisation.settings-changed",
      entityType: "organisation",
      entityId: actor.organisationId,
      details: {
        from: {
          name: before.name,
          reviewPeriodMonths: before.reviewPeriodMonths,
          secondFactorRoles: before.secondFactorRoles,
        },
        to: data,
      },
    });
  });
  // Who must enrol a second factor is read with the session.
  forgetSessions();
}

/** The logo for the pack's cover: PNG or JPEG, sniffed from its bytes, at most 300 kB. Null removes it. */
export async function setOrganisationLogo(actor: Actor | null, data: Uint8Array | null): Promise<void> {
  authorize(actor, "organisation:manage");
  let logoType: string | null = null;
  if (data) {
    if (data.byteLength === 0)
      throw new AppError("validation", "Choose a logo file", [{ path: "logo", message: "The file is empty" }]);
    if (data.byteLength > LOGO_MAX_BYTES)
      throw new AppError("payload_too_large", `The logo is larger than ${LOGO_MAX_BYTES / 1000} kB`);
    logoType = (await requireFileType(data, LOGO_TYPES, "The logo must be a PNG or JPEG image")).mime;
  }
  const db = await getDb();
  await db.transaction(async (tx) => {
    await tx
      .update(organisations)
      .set({ logo: data, logoType, updatedAt: new Date() })
      .where(eq(organisations.id, actor.organisationId));
    await recordAudit(tx, {
      organisationId: actor.organisationId,
      actorId: actor.id,
      action: data ? "organisation.logo-set" : "organisation.logo-removed",
      entityType: "organisation",
      entityId: actor.organisationId,
      details: data ? { bytes: data.byteLength, type: logoType } : {},
    });
  });
}

export async function getOrganisationLogo(actor: Actor | null): Promise<{ data: Uint8Array; type: string } | null> {
  authorize(actor, "profile:read");
  const db = await getDb();
  const [org] = await db
    .select({ logo: organisations.logo, type: organisations.logoType })
    .from(organisations)
    .where(eq(organisations.id, actor.organisationId));
  return org?.logo && org.type ? { data: org.logo, type: org.type } : null;
}
