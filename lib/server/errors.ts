// One error type for every refusal a handler or action can give; mapped to one JSON shape.
export type ApiErrorIssue = { path: string; message: string };

export class ApiError extends Error {
  constructor(
    public readonly status: 400 | 401 | 403 | 404 | 409 | 413 | 415 | 422 | 429 | 503,
    message: string,
    public readonly issues?: ApiErrorIssue[],
    public readonly extra?: Record<string, unknown>,
  ) {
    super(message);
  }
}

export const notFound = (what = "That item") => new ApiError(404, `${what} was not found.`);
export const conflict = (message: string, extra?: Record<string, unknown>) => new ApiError(409, message, undefined, extra);
