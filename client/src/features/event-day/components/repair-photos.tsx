import { Alert, Card } from '../../../components/ui/feedback';
import { photoUrl } from '../api/photo-url';
import type { ItemView } from '../api/types';
import { useUploadRepairPhotos } from '../api/upload-repair-photos';
import { useT } from '../../../lib/i18n';

/** Photos from the bench (the fault, a part number, the finished repair) for the knowledge base. */
export function RepairPhotos({ item }: { item: ItemView }) {
  const t = useT();
  const upload = useUploadRepairPhotos(item.id);
  const photos = item.photos.filter((p) => p.kind === 'repair');
  return (
    <Card>
      <h2 className="text-lg">{t('bench.photos.title')}</h2>
      <p className="mb-2 text-sm text-ink-soft">{t('bench.photos.lead')}</p>
      {photos.length > 0 && (
        <div className="mb-3 flex flex-wrap gap-2">
          {photos.map((p) => (
            <a key={p.id} href={photoUrl(p.id)} target="_blank" rel="noreferrer">
              <img src={photoUrl(p.id)} alt={t('bench.photos.alt')} className="size-24 rounded-lg object-cover" />
            </a>
          ))}
        </div>
      )}
      {item.can.record && photos.length < 3 && (
        <label className="flex min-h-11 cursor-pointer items-center justify-center rounded-lg bg-white font-bold text-navy ring-1 ring-navy/25 hover:bg-navy/5">
          {upload.isPending ? t('bench.photos.uploading') : t('bench.photos.add')}
          <input
            type="file"
            accept="image/jpeg,image/png,image/webp"
            capture="environment"
            multiple
            className="sr-only"
            onChange={(e) => {
              if (e.target.files?.length) upload.mutate(e.target.files);
              e.target.value = '';
            }}
          />
        </label>
      )}
      {upload.error && (
        <div className="mt-2">
          <Alert tone="error">{upload.error.message}</Alert>
        </div>
      )}
    </Card>
  );
}
