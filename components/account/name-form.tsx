"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { updateAccountSchema, type UpdateAccountInput } from "@/lib/schemas/account";
import { api } from "@/lib/client/api";
import { applyServerError } from "@/lib/client/form-errors";
import { queryKeys } from "@/lib/client/query-keys";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";
import { TextField } from "@/components/ui/text-field";

export function NameForm({ name }: { name: string }) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const [formError, setFormError] = useState<string>();
  const { register, handleSubmit, setError, formState } = useForm<UpdateAccountInput>({
    resolver: zodResolver(updateAccountSchema),
    defaultValues: { name },
  });
  const save = useMutation({
    mutationFn: (input: UpdateAccountInput) => api("/api/me", "PATCH", input),
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: queryKeys.me });
      router.refresh(); // the header shows the name
    },
    onError: (error) => setFormError(applyServerError(error, setError, ["name"])),
  });
  const onSubmit = handleSubmit((input) => {
    setFormError(undefined);
    save.reset();
    save.mutate(input);
  });
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <FormMessage error={formError} success={save.isSuccess ? "Name saved." : undefined} />
      <TextField label="Name" autoComplete="name" error={formState.errors.name?.message} {...register("name")} />
      <Button type="submit" disabled={save.isPending} className="self-start">
        {save.isPending ? "Saving…" : "Save name"}
      </Button>
    </form>
  );
}
