"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation } from "@tanstack/react-query";
import Link from "next/link";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { passwordResetConfirmSchema, type PasswordResetConfirmInput } from "@/lib/schemas/auth";
import { api } from "@/lib/client/api";
import { applyServerError } from "@/lib/client/form-errors";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";
import { TextField } from "@/components/ui/text-field";
import { linkClass } from "./auth-card";

export function ResetPasswordForm({ token }: { token: string }) {
  const [formError, setFormError] = useState<string>();
  const { register, handleSubmit, setError, formState } = useForm<PasswordResetConfirmInput>({
    resolver: zodResolver(passwordResetConfirmSchema),
    defaultValues: { token, password: "" },
  });
  const confirm = useMutation({
    mutationFn: (input: PasswordResetConfirmInput) => api("/api/auth/password-reset/confirm", "POST", input),
    onError: (error) => setFormError(applyServerError(error, setError, ["password"])),
  });
  const onSubmit = handleSubmit((input) => {
    setFormError(undefined);
    confirm.mutate(input);
  });
  if (confirm.isSuccess) {
    return (
      <div className="flex flex-col gap-4">
        <FormMessage success="Your password is changed. Sign in with the new one." />
        <Link href="/sign-in" className={linkClass}>Go to sign-in</Link>
      </div>
    );
  }
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <FormMessage error={formError ?? formState.errors.token?.message} />
      <input type="hidden" {...register("token")} />
      <TextField label="New password" type="password" autoComplete="new-password" error={formState.errors.password?.message} {...register("password")} />
      <Button type="submit" disabled={confirm.isPending}>
        {confirm.isPending ? "Saving…" : "Set new password"}
      </Button>
    </form>
  );
}
