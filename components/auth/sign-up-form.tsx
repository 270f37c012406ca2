"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation } from "@tanstack/react-query";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { PASSWORD_MIN_CHARS } from "@/lib/schemas/fields";
import { signUpSchema, type SignUpInput } from "@/lib/schemas/auth";
import { api } from "@/lib/client/api";
import { applyServerError } from "@/lib/client/form-errors";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";
import { TextField } from "@/components/ui/text-field";

export function SignUpForm({ next, email = "" }: { next: string; email?: string }) {
  const [formError, setFormError] = useState<string>();
  const { register, handleSubmit, setError, formState } = useForm<SignUpInput>({
    resolver: zodResolver(signUpSchema),
    defaultValues: { email, name: "", password: "" },
  });
  const signUp = useMutation({
    mutationFn: (input: SignUpInput) => api("/api/auth/sign-up", "POST", input),
    onSuccess: () => window.location.assign(next),
    onError: (error) => setFormError(applyServerError(error, setError, ["email", "name", "password"])),
  });
  const onSubmit = handleSubmit((input) => {
    setFormError(undefined);
    signUp.mutate(input);
  });
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <FormMessage error={formError} />
      <TextField label="Name" autoComplete="name" error={formState.errors.name?.message} {...register("name")} />
      <TextField label="E-mail" type="email" autoComplete="email" error={formState.errors.email?.message} {...register("email")} />
      <TextField
        label="Password"
        type="password"
        autoComplete="new-password"
        hint={`At least ${PASSWORD_MIN_CHARS} characters, not your e-mail address.`}
        error={formState.errors.password?.message}
        {...register("password")}
      />
      <Button type="submit" disabled={signUp.isPending || signUp.isSuccess}>
        {signUp.isPending ? "Creating your account…" : "Create account"}
      </Button>
    </form>
  );
}
