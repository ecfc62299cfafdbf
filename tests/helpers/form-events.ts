import { fireEvent } from '@testing-library/react';

/** Types a value into a field and leaves it, as a user does: the kit's Form checks a field on blur. */
export const typeInto = (el: HTMLElement, value: string): void => {
  fireEvent.change(el, { target: { value } });
  fireEvent.blur(el);
};

/** The texts that describe a control (its hint and its error), as a screen reader reads them. */
export const description = (el: HTMLElement): string =>
  (el.getAttribute('aria-describedby') ?? '')
    .split(' ')
    .filter(Boolean)
    .map((id) => document.getElementById(id)?.textContent)
    .join(' | ');
