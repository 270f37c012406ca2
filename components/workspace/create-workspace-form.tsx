"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { createWorkspaceSchema, type CreateWorkspaceInput } from "@/lib/schemas/workspace";
import { api } from "@/lib/client/api";
import { applyServerError } from "@/lib/client/form-errors";
import { queryKeys } from "@/lib/client/query-keys";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";
import { TextField } from "@/components/ui/text-field";

export function CreateWorkspaceForm() {
  const router = useRouter();
  const queryClient = useQueryClient();
  const [formError, setFormError] = useState<string>();
  const { register, handleSubmit, setError, formState } = useForm<CreateWorkspaceInput>({
    resolver: zodResolver(createWorkspaceSchema),
    defaultValues: { name: "" },
  });
  const create = useMutation({
    mutationFn: (input: CreateWorkspaceInput) =>
      api<{ workspace: { id: string; name: string } }>("/api/workspaces", "POST", input),
    onSuccess: async ({ workspace }) => {
      await queryClient.invalidateQueries({ queryKey: queryKeys.me });
      router.push(`/w/${workspace.id}`);
    },
    onError: (error) => setFormError(applyServerError(error, setError, ["name"])),
  });
  const onSubmit = handleSubmit((input) => {
    setFormError(undefined);
    create.mutate(input);
  });
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <FormMessage error={formError} />
      <TextField
        label="Workspace name"
        hint="Usually the programme or vehicle project, e.g. “C-segment PHEV 2029”."
        autoComplete="off"
        error={formState.errors.name?.message}
        {...register("name")}
      />
      <Button type="submit" disabled={create.isPending || create.isSuccess} className="self-start">
        {create.isPending ? "Creating…" : "Create workspace"}
      </Button>
    </form>
  );
}
