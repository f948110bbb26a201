import type { Action } from "@/lib/permissions";

/** The app's sections; each shows only to roles the permission table allows. */
export const NAVIGATION: { href: string; label: string; action: Action | null }[] = [
  { href: "/", label: "Overview", action: null },
  { href: "/assessments", label: "Assessments", action: "assessments:read" },
  { href: "/jobs", label: "Jobs", action: "jobs:read" },
  { href: "/load-register", label: "Load register", action: "components:read" },
  { href: "/hazard-library", label: "Hazard library", action: "hazard-library:read" },
  { href: "/reviews", label: "For review", action: "reviews:read" },
  { href: "/briefings", label: "Briefings", action: "briefings:run" },
  { href: "/admin/users", label: "People", action: "users:manage" },
  { href: "/admin/mail", label: "Sent e-mail", action: "mail-log:read" },
  { href: "/admin/organisation", label: "Organisation", action: "organisation:manage" },
];
