import { useCallback, useState } from 'react';

export interface Position {
  lat: number;
  lng: number;
  accuracyM: number;
}

/** What to tell the user when the device can't say where it is. */
export function geolocationMessage(code: number | 'unsupported'): string {
  switch (code) {
    case 'unsupported':
      return "This browser can't tell where you are.";
    case 1:
      return "Location is blocked for Clearwood. Allow it in your browser's site settings, then try again.";
    case 3:
      return 'Finding your position took too long. Step into the open and try again.';
    default:
      return "Your device couldn't find its position. Try again in a minute, away from buildings.";
  }
}

type State =
  | { status: 'idle' | 'locating'; position: Position | null }
  | { status: 'found'; position: Position }
  | { status: 'failed'; position: Position | null; message: string };

/**
 * One position fix at a time, on request; the last good one is kept while a new one is sought.
 * `unsupportedHint` says what to do instead on a device that cannot tell where it is.
 */
export function useGeolocation(unsupportedHint?: string) {
  const [state, setState] = useState<State>({ status: 'idle', position: null });

  const locate = useCallback(
    () =>
      new Promise<Position | null>((resolve) => {
        const geo = typeof navigator === 'undefined' ? undefined : navigator.geolocation;
        if (!geo) {
          setState((s) => ({
            status: 'failed',
            position: s.position,
            message: [geolocationMessage('unsupported'), unsupportedHint].filter(Boolean).join(' '),
          }));
          resolve(null);
          return;
        }
        setState((s) => ({ status: 'locating', position: s.position }));
        geo.getCurrentPosition(
          (fix) => {
            const position = {
              lat: fix.coords.latitude,
              lng: fix.coords.longitude,
              accuracyM: fix.coords.accuracy,
            };
            setState({ status: 'found', position });
            resolve(position);
          },
          (error) => {
            setState((s) => ({
              status: 'failed',
              position: s.position,
              message: geolocationMessage(error.code),
            }));
            resolve(null);
          },
          { enableHighAccuracy: true, timeout: 20_000, maximumAge: 10_000 },
        );
      }),
    [unsupportedHint],
  );

  return { ...state, locate };
}
