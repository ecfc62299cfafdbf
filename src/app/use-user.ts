import { useOutletContext } from 'react-router-dom';
import type { User } from '@shared/schemas/auth';

/** The signed-in user, inside the app layout. */
export const useUser = (): User => useOutletContext<User>();
