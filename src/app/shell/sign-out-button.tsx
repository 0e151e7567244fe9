import { Button, type ButtonProps } from '@/components/ui/button';
import { useSignOut } from './shell-nav';

const lost = (n: number) =>
  n === 1 ? '1 entry that is not on the server' : `${n} entries that are not on the server`;

/** Sign out, after a warning when entries recorded on this device would be lost. */
export function SignOutButton(props: Pick<ButtonProps, 'variant' | 'block' | 'className'>) {
  const { signOut, confirm, cancel, asking, unsent, pending } = useSignOut();
  if (asking)
    return (
      <div
        role="alertdialog"
        aria-labelledby="sign-out-warning"
        className="mt-2 flex flex-col gap-2"
      >
        <p id="sign-out-warning" className="font-bold text-alert">
          Signing out deletes {lost(unsent)} from this device. Connect and let them send first, or
          sign out anyway.
        </p>
        <Button variant="primary" block onClick={cancel} field>
          Stay signed in
        </Button>
        <Button block onClick={confirm} disabled={pending} field>
          Sign out and lose {unsent}
        </Button>
      </div>
    );
  return (
    <Button {...props} onClick={signOut} disabled={pending}>
      Sign out
    </Button>
  );
}
