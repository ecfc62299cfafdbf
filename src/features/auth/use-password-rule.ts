import { useEffect, useRef, useState } from 'react';

export type PasswordCheck = (password: string, email: string) => string | null;

/**
 * The shared password rule (shared/password-policy.ts), for a form's schema to call. Loaded on the
 * page that sets a password only: its common-password dictionaries are too large for every page's
 * bundle. `rule.current` is null until it has loaded; `ready` turns true then, so the form can
 * check again what was typed meanwhile.
 */
export function usePasswordRule(): { rule: { readonly current: PasswordCheck | null }; ready: boolean } {
  const rule = useRef<PasswordCheck | null>(null);
  const [ready, setReady] = useState(false);
  useEffect(() => {
    let live = true;
    void import('@shared/password-policy').then((policy) => {
      if (!live) return;
      rule.current = policy.passwordProblem;
      setReady(true);
    });
    return () => {
      live = false;
    };
  }, []);
  return { rule, ready };
}
