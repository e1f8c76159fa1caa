import { PageTitle, Card } from '../components/ui/feedback';
import { useT } from '../lib/i18n';

/** The cautions, in the order a repair meets them; each one's words are `safety.<id>.title` and `.text`. */
const CAUTIONS = ['proveDead', 'capacitors', 'microwave', 'lithium', 'thermalFuse', 'hot', 'testBeforeHome'];

export function SafetyPage() {
  const t = useT();
  return (
    <div className="max-w-3xl">
      <PageTitle title={t('safety.title')} lead={t('safety.lead')} />
      <div className="space-y-3">
        {CAUTIONS.map((id) => (
          <Card key={id}>
            <h2 className="flex items-center gap-2 text-lg">
              <span aria-hidden className="text-copper">
                ⚠
              </span>
              {t(`safety.${id}.title`)}
            </h2>
            <p className="mt-1 text-ink-soft">{t(`safety.${id}.text`)}</p>
          </Card>
        ))}
      </div>
      <p className="mt-6 text-sm text-ink-soft">{t('safety.footer')}</p>
    </div>
  );
}
