"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation } from "@tanstack/react-query";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { passwordResetRequestSchema, type PasswordResetRequestInput } from "@/lib/schemas/auth";
import { api } from "@/lib/client/api";
import { applyServerError } from "@/lib/client/form-errors";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";
import { TextField } from "@/components/ui/text-field";

export function ForgotPasswordForm() {
  const [formError, setFormError] = useState<string>();
  const { register, handleSubmit, setError, formState } = useForm<PasswordResetRequestInput>({
    resolver: zodResolver(passwordResetRequestSchema),
    defaultValues: { email: "" },
  });
  const request = useMutation({
    mutationFn: (input: PasswordResetRequestInput) => api("/api/auth/password-reset", "POST", input),
    onError: (error) => setFormError(applyServerError(error, setError, ["email"])),
  });
  const onSubmit = handleSubmit((input) => {
    setFormError(undefined);
    request.mutate(input);
  });
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <FormMessage
        error={formError}
        success={request.isSuccess ? "If an account uses that address, a reset link is on its way. It works once and expires." : undefined}
      />
      <TextField label="E-mail" type="email" autoComplete="email" error={formState.errors.email?.message} {...register("email")} />
      <Button type="submit" disabled={request.isPending}>
        {request.isPending ? "Sending…" : "Send reset link"}
      </Button>
    </form>
  );
}
