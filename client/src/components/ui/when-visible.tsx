import { startTransition, Suspense, useEffect, useRef, useState, type ReactNode } from 'react';

/**
 * Renders `children` once the box comes near the screen (within `margin`), holding its height until then, so a
 * drawing below the fold costs a phone nothing while the page loads. Without IntersectionObserver it renders at once.
 * `prefetch` (the drawing's code, say) starts earlier, once the box is within `prefetchMargin`, so that rendering
 * can wait until the box is really on screen (margin 0) without the visitor waiting for the download. The render is a
 * transition: React draws it in short slices, so a slow phone still answers a tap meanwhile.
 */
export function WhenVisible({
  height,
  margin = '300px',
  prefetch,
  prefetchMargin = '600px',
  children,
}: {
  height: number;
  margin?: string;
  prefetch?: () => unknown;
  prefetchMargin?: string;
  children: ReactNode;
}) {
  const box = useRef<HTMLDivElement>(null);
  const [seen, setSeen] = useState(() => typeof IntersectionObserver === 'undefined');
  useEffect(() => {
    if (seen || !box.current) return;
    const observer = new IntersectionObserver(
      (entries) => {
        if (entries.some((e) => e.isIntersecting)) startTransition(() => setSeen(true));
      },
      { rootMargin: margin },
    );
    observer.observe(box.current);
    return () => observer.disconnect();
  }, [seen, margin]);
  useEffect(() => {
    if (seen || !prefetch || !box.current) return;
    const observer = new IntersectionObserver(
      (entries) => {
        if (!entries.some((e) => e.isIntersecting)) return;
        observer.disconnect();
        prefetch();
      },
      { rootMargin: prefetchMargin },
    );
    observer.observe(box.current);
    return () => observer.disconnect();
  }, [seen, prefetch, prefetchMargin]);
  return (
    <div ref={box} style={{ minHeight: height }}>
      {seen && <Suspense fallback={null}>{children}</Suspense>}
    </div>
  );
}
