import { CSV_TEMPLATE } from "@/assessments/load-register/schemas";
import { handler } from "@/lib/api";
import { requireApiActor } from "@/lib/auth/api";

export const GET = handler(async () => {
  await requireApiActor("components:write");
  return new Response(CSV_TEMPLATE, {
    headers: {
      "content-type": "text/csv; charset=utf-8",
      "content-disposition": 'attachment; filename="heftwise-load-register.csv"',
    },
  });
});
