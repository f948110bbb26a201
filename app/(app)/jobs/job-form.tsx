"use client";

import { MILEAGE_HINT } from "@/lib/mileage";
import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm, type Resolver } from "react-hook-form";
import { FormMessage, PrimaryButton, TextField } from "@/app/_components/form";
import { jobSchema, type JobInput } from "@/assessments/jobs/schemas";
import { saveJobAction } from "./actions";

export function JobForm({
  jobId,
  initial,
}: {
  jobId: string | null;
  initial?: Partial<Record<keyof JobInput, string | null>>;
}) {
  const router = useRouter();
  const [failure, setFailure] = useState<string | null>(null);
  const defaults = Object.fromEntries(Object.entries(initial ?? {}).map(([k, v]) => [k, v ?? ""])) as JobInput;
  const { register, handleSubmit, setError, formState } = useForm<JobInput>({
    resolver: zodResolver(jobSchema) as unknown as Resolver<JobInput>,
    defaultValues: defaults,
  });
  const e = formState.errors;

  const onSubmit = handleSubmit(async (values) => {
    setFailure(null);
    const result = await saveJobAction(jobId, values);
    if (result.ok) {
      router.push("/jobs");
      router.refresh();
      return;
    }
    for (const issue of result.issues ?? []) setError(issue.path as keyof JobInput, { message: issue.message });
    setFailure(result.message);
  });

  return (
    <form
      onSubmit={onSubmit}
      noValidate
      aria-label="Job"
      className="space-y-4 rounded-lg border border-rule bg-white p-4"
    >
      {failure && <FormMessage tone="error">{failure}</FormMessage>}
      <div className="grid gap-3 md:grid-cols-2">
        <TextField label="Job name" error={e.name?.message} {...register("name")} />
        <TextField label="Client" error={e.client?.message} {...register("client")} />
        <TextField label="Location" error={e.location?.message} {...register("location")} />
        <TextField label="Access point" error={e.accessPoint?.message} {...register("accessPoint")} />
      </div>
      <fieldset className="grid gap-3 md:grid-cols-2">
        <legend className="font-bold">Railway (leave blank off the railway)</legend>
        <TextField label="Line reference" error={e.lineReference?.message} {...register("lineReference")} />
        <TextField label="Mileage" hint={MILEAGE_HINT} error={e.mileage?.message} {...register("mileage")} />
      </fieldset>
      <fieldset className="grid gap-3 md:grid-cols-2">
        <legend className="font-bold">Emergency</legend>
        <TextField
          label="Nearest hospital with an emergency department"
          error={e.nearestHospital?.message}
          {...register("nearestHospital")}
        />
        <TextField
          label="Emergency arrangements"
          error={e.emergencyArrangements?.message}
          {...register("emergencyArrangements")}
        />
        <TextField label="Site contact" error={e.siteContactName?.message} {...register("siteContactName")} />
        <TextField
          label="Site contact phone"
          type="tel"
          error={e.siteContactPhone?.message}
          {...register("siteContactPhone")}
        />
      </fieldset>
      <PrimaryButton type="submit" disabled={formState.isSubmitting}>
        {formState.isSubmitting ? "Saving…" : "Save job"}
      </PrimaryButton>
    </form>
  );
}
