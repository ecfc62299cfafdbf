import { useEffect, useState } from 'react';

type Check = (password: string, email: string) => string | null;

/**
 * The shared password rule, said before the form is sent. Loaded on the page that sets a password
 * only: its common-password dictionaries are too large for every page's bundle.
 */
export function usePasswordProblem(password: string, email: string): string | null {
  const [check, setCheck] = useState<{ run: Check } | null>(null);
  useEffect(() => {
    let live = true;
    void import('@shared/password-policy').then((policy) => {
      if (live) setCheck({ run: policy.passwordProblem });
    });
    return () => {
      live = false;
    };
  }, []);
  return check && password !== '' ? check.run(password, email) : null;
}
