"use client";
import { useMutation } from "@tanstack/react-query";
import { api } from "@/lib/client/api";
import { Button } from "@/components/ui/button";

export function SignOutButton({ variant = "ghost" }: { variant?: "ghost" | "secondary" }) {
  const signOut = useMutation({
    mutationFn: () => api("/api/auth/sign-out", "POST"),
    // A full load drops every cached query of the old session.
    onSettled: () => window.location.assign("/sign-in"),
  });
  return (
    <Button variant={variant} onClick={() => signOut.mutate()} disabled={signOut.isPending}>
      {signOut.isPending ? "Signing out…" : "Sign out"}
    </Button>
  );
}
