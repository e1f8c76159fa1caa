import { Suspense, useEffect, useRef, useState, type ReactNode } from 'react';

/**
 * Renders `children` once the box comes near the screen (within `margin`), holding its height until then, so a
 * drawing below the fold costs a phone nothing while the page loads. Without IntersectionObserver it renders at once.
 */
export function WhenVisible({
  height,
  margin = '300px',
  children,
}: {
  height: number;
  margin?: string;
  children: ReactNode;
}) {
  const box = useRef<HTMLDivElement>(null);
  const [seen, setSeen] = useState(() => typeof IntersectionObserver === 'undefined');
  useEffect(() => {
    if (seen || !box.current) return;
    const observer = new IntersectionObserver(
      (entries) => {
        if (entries.some((e) => e.isIntersecting)) setSeen(true);
      },
      { rootMargin: margin },
    );
    observer.observe(box.current);
    return () => observer.disconnect();
  }, [seen, margin]);
  return (
    <div ref={box} style={{ minHeight: height }}>
      {seen && <Suspense fallback={null}>{children}</Suspense>}
    </div>
  );
}
