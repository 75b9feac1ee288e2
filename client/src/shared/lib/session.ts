import { createContext, useContext } from 'react';
import type { UserView } from '../../../../shared/api/auth';

/*
 * The signed-in person, provided by the auth guard around every signed-in page. It lives
 * in shared/ so that any feature can read who is signed in without importing the auth
 * feature (features never import each other).
 */
export const CurrentUserContext = createContext<UserView | null>(null);

export function useCurrentUser(): UserView {
  const user = useContext(CurrentUserContext);
  if (user === null) throw new Error('useCurrentUser must be used below the sign-in guard');
  return user;
}
