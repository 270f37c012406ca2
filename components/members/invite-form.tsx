"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { inviteSchema, type InviteInput } from "@/lib/schemas/workspace";
import { api } from "@/lib/client/api";
import { applyServerError } from "@/lib/client/form-errors";
import { queryKeys } from "@/lib/client/query-keys";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";
import { SelectField } from "@/components/ui/select-field";
import { TextField } from "@/components/ui/text-field";
import { ROLE_OPTIONS } from "./types";

export function InviteForm({ workspaceId }: { workspaceId: string }) {
  const queryClient = useQueryClient();
  const [formError, setFormError] = useState<string>();
  const [sentTo, setSentTo] = useState<string>();
  const { register, handleSubmit, setError, formState, reset } = useForm<InviteInput>({
    resolver: zodResolver(inviteSchema),
    defaultValues: { email: "", role: "editor" },
  });
  const invite = useMutation({
    mutationFn: (input: InviteInput) => api(`/api/workspaces/${workspaceId}/invitations`, "POST", input),
    onSuccess: async (_data, input) => {
      setSentTo(input.email);
      reset({ email: "", role: input.role });
      await queryClient.invalidateQueries({ queryKey: queryKeys.members(workspaceId) });
    },
    onError: (error) => setFormError(applyServerError(error, setError, ["email", "role"])),
  });
  const onSubmit = handleSubmit((input) => {
    setFormError(undefined);
    setSentTo(undefined);
    invite.mutate(input);
  });
  return (
    <form onSubmit={onSubmit} noValidate aria-label="Invite a colleague" className="flex flex-col gap-4">
      <FormMessage error={formError} success={sentTo ? `Invitation sent to ${sentTo}.` : undefined} />
      <div className="grid gap-4 sm:grid-cols-[1fr_11rem_auto] sm:items-start">
        <TextField label="E-mail" type="email" autoComplete="off" placeholder="colleague@example.com" error={formState.errors.email?.message} {...register("email")} />
        <SelectField label="Role" options={ROLE_OPTIONS} error={formState.errors.role?.message} {...register("role")} />
        <Button type="submit" disabled={invite.isPending} className="sm:mt-[1.625rem] sm:py-2.5">
          {invite.isPending ? "Sending…" : "Send invitation"}
        </Button>
      </div>
    </form>
  );
}
