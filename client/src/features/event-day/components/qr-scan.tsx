import { useEffect, useRef, useState } from 'react';
import { Button } from '../../../components/ui/button';
import { useT } from '../../../lib/i18n';

/**
 * The device camera reading a QR code (the qr-scanner package, loaded only when the desk opens the camera).
 * Browsers allow the camera on https or localhost only; the desk can always type the reference instead.
 */
export function QrScan({ onResult, onClose }: { onResult: (text: string) => void; onClose: () => void }) {
  const t = useT();
  const video = useRef<HTMLVideoElement>(null);
  const [error, setError] = useState<'no-camera' | 'failed' | null>(null);
  const done = useRef(onResult);
  done.current = onResult;

  useEffect(() => {
    let scanner: { start: () => Promise<void>; stop: () => void; destroy: () => void } | undefined;
    let cancelled = false;
    void (async () => {
      try {
        const { default: QrScanner } = await import('qr-scanner');
        if (cancelled || !video.current) return;
        if (!(await QrScanner.hasCamera())) throw new Error('no-camera');
        const s = new QrScanner(
          video.current,
          (r) => {
            s.stop();
            done.current(r.data);
          },
          { returnDetailedScanResult: true, highlightScanRegion: true, highlightCodeOutline: true },
        );
        scanner = s;
        await s.start();
      } catch (e) {
        const msg = String((e as Error)?.message ?? e);
        setError(msg === 'no-camera' ? 'no-camera' : 'failed');
      }
    })();
    return () => {
      cancelled = true;
      scanner?.destroy();
    };
  }, []);

  return (
    <div className="space-y-3 rounded-xl bg-ink p-3 text-white">
      <div className="flex items-center justify-between">
        <p className="font-bold">{t('desk.scan.hold')}</p>
        <Button variant="secondary" onClick={onClose}>
          {t('desk.scan.close')}
        </Button>
      </div>
      {error ? (
        <p role="alert" className="rounded-lg bg-white/10 p-3">
          {t(error === 'no-camera' ? 'desk.scan.noCamera' : 'desk.scan.failed')} {t('desk.scan.typeInstead')}
        </p>
      ) : (
        <video ref={video} className="aspect-video w-full rounded-lg bg-black object-cover" muted playsInline />
      )}
    </div>
  );
}
