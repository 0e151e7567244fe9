/** Where the server writes what an operator should see; tests pass a quiet or recording one. */
export interface Logger {
  info(message: string): void;
  error(message: string, err?: unknown): void;
}

export const consoleLogger: Logger = {
  info: (message) => console.log(message),
  error: (message, err) => console.error(message, err ?? ''),
};

export const quietLogger: Logger = { info: () => undefined, error: () => undefined };
