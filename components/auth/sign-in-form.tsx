"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation } from "@tanstack/react-query";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { signInSchema, type SignInInput } from "@/lib/schemas/auth";
import { api } from "@/lib/client/api";
import { applyServerError } from "@/lib/client/form-errors";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";
import { TextField } from "@/components/ui/text-field";

export function SignInForm({ next }: { next: string }) {
  const [formError, setFormError] = useState<string>();
  const { register, handleSubmit, setError, formState } = useForm<SignInInput>({
    resolver: zodResolver(signInSchema),
    defaultValues: { email: "", password: "" },
  });
  const signIn = useMutation({
    mutationFn: (input: SignInInput) => api("/api/auth/sign-in", "POST", input),
    // A full page load: every server component must see the new session cookie.
    onSuccess: () => window.location.assign(next),
    onError: (error) => setFormError(applyServerError(error, setError, ["email", "password"])),
  });
  const onSubmit = handleSubmit((input) => {
    setFormError(undefined);
    signIn.mutate(input);
  });
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <FormMessage error={formError} />
      <TextField label="E-mail" type="email" autoComplete="email" error={formState.errors.email?.message} {...register("email")} />
      <TextField label="Password" type="password" autoComplete="current-password" error={formState.errors.password?.message} {...register("password")} />
      <Button type="submit" disabled={signIn.isPending || signIn.isSuccess}>
        {signIn.isPending ? "Signing in…" : "Sign in"}
      </Button>
    </form>
  );
}
