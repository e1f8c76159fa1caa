import { useId } from 'react';
import { useSearchParams } from 'react-router';
import { useQueryClient } from '@tanstack/react-query';
import { isLanguage, LANGUAGE_NAMES, LANGUAGES } from '../../../../shared/i18n/languages';
import { chooseLanguage, useLanguage, useT } from '../../lib/i18n';

/** The language of every page, each named in itself; the choice is kept on this device (and on the account). */
export function LanguagePicker() {
  const t = useT();
  const lang = useLanguage();
  const id = useId();
  const [params, setParams] = useSearchParams();
  const queryClient = useQueryClient();
  const pick = async (next: string) => {
    if (!isLanguage(next)) return;
    // A ?lang= in the address would win over the choice on the next load.
    if (params.has('lang')) {
      const rest = new URLSearchParams(params);
      rest.delete('lang');
      setParams(rest, { replace: true });
    }
    await chooseLanguage(next);
    // Answers that carry the server's words are asked for again in the new language.
    void queryClient.invalidateQueries();
  };
  return (
    <div className="flex items-center gap-2">
      <label htmlFor={id} className="font-semibold text-navy">
        {t('common.language')}
      </label>
      <select
        id={id}
        value={lang}
        onChange={(e) => void pick(e.target.value)}
        className="min-h-11 rounded-lg border border-ink/20 bg-white px-3 text-base text-ink"
      >
        {LANGUAGES.map((l) => (
          <option key={l} value={l} lang={l}>
            {LANGUAGE_NAMES[l]}
          </option>
        ))}
      </select>
    </div>
  );
}
