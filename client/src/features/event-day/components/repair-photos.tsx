import { Alert, Card } from '../../../components/ui/feedback';
import { photoUrl } from '../api/photo-url';
import type { ItemView } from '../api/types';
import { useUploadRepairPhotos } from '../api/upload-repair-photos';

/** Photos from the bench (the fault, a part number, the finished repair) for the knowledge base. */
export function RepairPhotos({ item }: { item: ItemView }) {
  const upload = useUploadRepairPhotos(item.id);
  const photos = item.photos.filter((p) => p.kind === 'repair');
  return (
    <Card>
      <h2 className="text-lg">Repair photos</h2>
      <p className="mb-2 text-sm text-ink-soft">
        The fault, a part number, the finished repair. At most 3; no faces, please.
      </p>
      {photos.length > 0 && (
        <div className="mb-3 flex flex-wrap gap-2">
          {photos.map((p) => (
            <a key={p.id} href={photoUrl(p.id)} target="_blank" rel="noreferrer">
              <img src={photoUrl(p.id)} alt="Repair photo" className="size-24 rounded-lg object-cover" />
            </a>
          ))}
        </div>
      )}
      {item.can.record && photos.length < 3 && (
        <label className="flex min-h-11 cursor-pointer items-center justify-center rounded-lg bg-white font-bold text-navy ring-1 ring-navy/25 hover:bg-navy/5">
          {upload.isPending ? 'Uploading…' : 'Add photos'}
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
