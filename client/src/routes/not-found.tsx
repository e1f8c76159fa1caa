import { Link } from 'react-router';
import { paths } from '../config/paths';
import { useT } from '../lib/i18n';

export function NotFoundPage() {
  const t = useT();
  return (
    <div className="py-16 text-center">
      <h1 className="text-3xl">{t('common.notFound.title')}</h1>
      <p className="mt-2 text-ink-soft">{t('common.notFound.text')}</p>
      <Link to={paths.home()} className="mt-6 inline-block font-bold text-copper-dark underline">
        {t('common.notFound.back')}
      </Link>
    </div>
  );
}
