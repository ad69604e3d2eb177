/** Body of every error answer from /api. `fields` maps a request field to the reason it was refused. */
export interface ApiErrorBody {
  error: { code: string; message: string; retryAfterSeconds?: number; details?: Record<string, unknown> };
  fields?: Record<string, string>;
}
