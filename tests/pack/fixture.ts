/**
 * A pack input built from the demo scenario's templates and load register (invented data): the
 * three templates' tasks repeated to the number asked, lift team filled in. Used by the pack tests
 * and by `npm run bench:pack`.
 */
import { TEMPLATES } from "@/assessments/method-statement/templates";
import { reviewContent, type RegisterEntry } from "@/assessments/method-statement/score-task";
import type { PackInput } from "@/assessments/pack/document";
import { demoLiftSchedule, DEMO_COMPONENTS, DEMO_LIFT_TEAM } from "@/assessments/demo/scenario";
import { drawnSignaturePng } from "@/lib/png";

export function packInput(taskCount: number, overrides: Partial<PackInput> = {}): PackInput {
  const register: RegisterEntry[] = DEMO_COMPONENTS.map((c, i) => ({
    id: `00000000-0000-4000-8000-${String(i).padStart(12, "0")}`,
    name: c.name,
    massKg: c.massKg,
    grip: c.grip,
    massSource: c.massSource,
  }));
  const byName = (name: string) => register.find((c) => c.name === name)?.id ?? null;
  const base = TEMPLATES.map((t) => t.build(byName));
  const content = { ...base[2], tasks: [] as (typeof base)[number]["tasks"], hazards: base.flatMap((b) => b.hazards) };
  // A fixed day, so the pack's content is the same on every run.
  const schedule = demoLiftSchedule(new Date("2026-12-01T00:00:00Z"));
  for (let i = 0; content.tasks.length < taskCount; i++) {
    const task = structuredClone(base[i % 3].tasks[i % base[i % 3].tasks.length]);
    task.id = `t-${content.tasks.length + 1}`;
    if (task.lift) Object.assign(task.lift, { ...schedule, people: DEMO_LIFT_TEAM });
    content.tasks.push(task);
  }
  return {
    organisation: "Brackenfold Lineside Ltd",
    logo: null,
    signingRecord: [],
    title: `Pack of ${taskCount} handling tasks`,
    job: {
      name: "Hollin Vale loop",
      client: "Wendmoor Railway Infrastructure",
      location: "Hollin Vale",
      lineReference: "WHV",
      mileage: "14m 22ch",
      accessPoint: "Gorsey Lane",
      siteContactName: "Tamsin Greyholt",
      siteContactPhone: "07700 900418",
    },
    revision: {
      id: "00000000-0000-4000-8000-00000000beef",
      number: 1,
      status: "approved",
      authorName: "Idris Pennock",
      approverName: "Ruth Okonjo-Vale",
      submittedAt: new Date("2027-01-10T09:30:00Z"),
      approvedAt: new Date("2027-01-11T14:05:00Z"),
      reviewDate: "2027-07-20",
      contentHash: "9f2c".repeat(16),
    },
    content,
    scores: reviewContent(content, register).scores,
    componentNames: Object.fromEntries(register.map((c) => [c.id, c.name])),
    signatures: [
      {
        name: "Ruth Okonjo-Vale",
        role: "Contracts manager",
        signedAt: new Date("2027-01-11T14:05:00Z"),
        png: drawnSignaturePng(2),
      },
    ],
    briefings: [],
    verifyUrl: "http://localhost:3000/verify",
    ...overrides,
  };
}
