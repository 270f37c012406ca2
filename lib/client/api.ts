// The one way client code talks to our JSON API. Non-2xx answers become an ApiError that carries
// the status, the server's message and (for 422) the per-field messages.

export class ApiError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly fields: Record<string, string> = {},
  ) {
    super(message);
    this.name = "ApiError";
  }
}

type Method = "GET" | "POST" | "PATCH" | "PUT" | "DELETE";

export async function api<T = unknown>(path: string, method: Method = "GET", body?: unknown): Promise<T> {
  let response: Response;
  try {
    response = await fetch(path, {
      method,
      credentials: "same-origin",
      headers: body === undefined ? { accept: "application/json" } : { "content-type": "application/json", accept: "application/json" },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
  } catch {
    throw new ApiError(0, "The server could not be reached. Check your connection and try again.");
  }
  if (response.status === 204) return undefined as T;
  const payload: unknown = await response.json().catch(() => null);
  if (!response.ok) throw toApiError(response.status, payload);
  return payload as T;
}

function toApiError(status: number, payload: unknown): ApiError {
  const record = payload && typeof payload === "object" ? (payload as Record<string, unknown>) : {};
  const message = typeof record.error === "string" ? record.error : fallbackMessage(status);
  const fields: Record<string, string> = {};
  if (record.fields && typeof record.fields === "object") {
    for (const [key, value] of Object.entries(record.fields as Record<string, unknown>)) {
      if (typeof value === "string") fields[key] = value;
      else if (Array.isArray(value) && typeof value[0] === "string") fields[key] = value[0];
    }
  }
  return new ApiError(status, message, fields);
}

function fallbackMessage(status: number): string {
  if (status === 401) return "Sign in first.";
  if (status === 403) return "You do not have the right to do that in this workspace.";
  if (status === 404) return "Not found.";
  if (status === 409) return "That conflicts with the current state. Reload and try again.";
  if (status === 410) return "This link has expired or has already been used.";
  if (status === 413) return "That is too large to send.";
  if (status === 429) return "Too many attempts. Wait a little and try again.";
  return `The server answered with an error (${status}). Try again.`;
}
