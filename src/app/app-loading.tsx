/** Shown for the moment between opening Clearwood and knowing who is signed in. */
export function AppLoading() {
  return (
    <div role="status" className="flex min-h-screen items-center justify-center text-bark">
      Opening Clearwood…
    </div>
  );
}
