"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation } from "@tanstack/react-query";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { changePasswordSchema, type ChangePasswordInput } from "@/lib/schemas/account";
import { PASSWORD_MIN_CHARS } from "@/lib/schemas/fields";
import { api } from "@/lib/client/api";
import { applyServerError } from "@/lib/client/form-errors";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";
import { TextField } from "@/components/ui/text-field";

export function PasswordForm() {
  const [formError, setFormError] = useState<string>();
  const { register, handleSubmit, setError, formState, reset } = useForm<ChangePasswordInput>({
    resolver: zodResolver(changePasswordSchema),
    defaultValues: { currentPassword: "", newPassword: "" },
  });
  const save = useMutation({
    mutationFn: (input: ChangePasswordInput) => api("/api/me/password", "POST", input),
    onSuccess: () => reset(),
    onError: (error) => setFormError(applyServerError(error, setError, ["currentPassword", "newPassword"])),
  });
  const onSubmit = handleSubmit((input) => {
    setFormError(undefined);
    save.reset();
    save.mutate(input);
  });
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <FormMessage error={formError} success={save.isSuccess ? "Password changed." : undefined} />
      <TextField label="Current password" type="password" autoComplete="current-password" error={formState.errors.currentPassword?.message} {...register("currentPassword")} />
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        hint={`At least ${PASSWORD_MIN_CHARS} characters.`}
        error={formState.errors.newPassword?.message}
        {...register("newPassword")}
      />
      <Button type="submit" disabled={save.isPending} className="self-start">
        {save.isPending ? "Saving…" : "Change password"}
      </Button>
    </form>
  );
}
