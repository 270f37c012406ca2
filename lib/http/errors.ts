// Typed errors that the route-handler wrapper maps to statuses. Their messages are meant for
// people and are sent as-is; anything else thrown becomes a generic 500.
export class HttpError extends Error {
  readonly status: number;
  readonly headers: Record<string, string>;
  constructor(status: number, message: string, headers: Record<string, string> = {}) {
    super(message);
    this.name = new.target.name;
    this.status = status;
    this.headers = headers;
  }
  body(): Record<string, unknown> {
    return { error: this.message };
  }
}

export class Unauthorized extends HttpError {
  constructor(message = "sign in first") {
    super(401, message);
  }
}
export class Forbidden extends HttpError {
  constructor(message = "your role in this workspace does not allow this") {
    super(403, message);
  }
}
export class NotFound extends HttpError {
  constructor(message = "not found") {
    super(404, message);
  }
}
export class Conflict extends HttpError {
  constructor(message: string) {
    super(409, message);
  }
}
export class Gone extends HttpError {
  constructor(message: string) {
    super(410, message);
  }
}
export class PayloadTooLarge extends HttpError {
  constructor(limitBytes: number) {
    super(413, `the request body is larger than ${Math.round(limitBytes / 1024)} KiB`);
  }
}
export class UnsupportedMediaType extends HttpError {
  constructor() {
    super(415, "send the body as JSON (Content-Type: application/json)");
  }
}
export class Unprocessable extends HttpError {
  readonly fields: Record<string, string>;
  constructor(fields: Record<string, string>, message = "some fields are not valid") {
    super(422, message);
    this.fields = fields;
  }
  override body(): Record<string, unknown> {
    return { error: this.message, fields: this.fields };
  }
}
export class TooManyRequests extends HttpError {
  readonly retryAfterS: number;
  constructor(retryAfterS: number, message = "too many attempts; try again later") {
    const seconds = Math.max(1, Math.ceil(retryAfterS));
    super(429, message, { "Retry-After": String(seconds) });
    this.retryAfterS = seconds;
  }
  override body(): Record<string, unknown> {
    return { error: this.message, retryAfterS: this.retryAfterS };
  }
}
