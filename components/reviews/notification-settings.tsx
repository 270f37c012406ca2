"use client";
// E-mail on/off per kind of review notification (account page).
import { useState } from "react";
import { api, ApiError } from "@/lib/client/api";
import { FormMessage } from "@/components/ui/form-message";

type Settings = { reviewRequests: boolean; mentions: boolean; verdicts: boolean };

const KINDS: { key: keyof Settings; label: string; hint: string }[] = [
  { key: "reviewRequests", label: "Review requests", hint: "someone asks you to review a version" },
  { key: "mentions", label: "Mentions", hint: "someone @mentions you in a comment" },
  { key: "verdicts", label: "Verdicts", hint: "a reviewer approves or requests changes on a review you asked for" },
];

export function NotificationSettingsForm({ initial }: { initial: Settings }) {
  const [settings, setSettings] = useState(initial);
  const [error, setError] = useState<string>();
  const [saved, setSaved] = useState<string>();
  const toggle = async (key: keyof Settings, on: boolean) => {
    const next = { ...settings, [key]: on };
    setSettings(next);
    setError(undefined);
    try {
      const res = await api<{ settings: Settings }>("/api/me/notifications", "PUT", next);
      setSettings(res.settings);
      setSaved("Saved.");
    } catch (e) {
      setSettings(settings);
      setError(e instanceof ApiError ? e.message : "Something went wrong. Try again.");
    }
  };
  return (
    <div className="flex flex-col gap-3" data-notification-settings>
      <FormMessage error={error} success={saved} />
      {KINDS.map((k) => (
        <label key={k.key} className="flex items-start gap-3 text-sm">
          <input type="checkbox" className="mt-1" checked={settings[k.key]} onChange={(e) => void toggle(k.key, e.target.checked)} />
          <span><span className="font-medium">{k.label}</span><span className="block text-muted">E-mail me when {k.hint}.</span></span>
        </label>
      ))}
    </div>
  );
}
