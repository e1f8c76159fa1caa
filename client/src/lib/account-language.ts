import type { SessionUser } from '../../../shared/schemas/auth';
import { api } from './api';
import { userKeys } from './auth';
import { chooseLanguage, currentLanguage, onLanguageChosen } from './i18n';
import { queryClient } from './query-client';

/**
 * A signed-in person's language (loaded only once someone signs in): the account's choice wins over this device's
 * on sign-in, unless the address asks for one (?lang=), and each new choice in the picker is kept on the account.
 * Returns the way to stop (on sign-out).
 */
export function followAccount(user: SessionUser): () => void {
  let kept = user.language;
  const stop = onLanguageChosen((lang) => {
    if (lang === kept) return;
    kept = lang;
    queryClient.setQueryData<SessionUser | null>(userKeys.me, (u) => (u ? { ...u, language: lang } : u));
    void api('PUT', '/api/auth/me/language', { language: lang }).catch(() => undefined);
  });
  if (kept && kept !== currentLanguage() && !new URLSearchParams(location.search).has('lang'))
    void chooseLanguage(kept).then(() => queryClient.invalidateQueries());
  return stop;
}
