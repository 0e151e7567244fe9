/** An operational error: becomes `{ error: { code, message, fields? } }` with this status. */
export class AppError extends Error {
  constructor(
    public readonly status: number,
    public readonly code: string,
    message: string,
    public readonly fields?: Record<string, string>,
  ) {
    super(message);
  }
}

export const notFound = (what: string) => new AppError(404, 'not-found', `${what} not found`);
export const forbidden = (message = 'Your role in this sugarbush may not do that') =>
  new AppError(403, 'forbidden', message);
