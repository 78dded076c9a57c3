import { useEffect, useRef, useState, type ReactNode, type RefObject } from 'react';

/**
 * True once the element has come within `margin` of the viewport (and from then on), or at once when `now`
 * is set or the browser has no IntersectionObserver.
 */
export function useNearViewport(ref: RefObject<Element | null>, now = false, margin = '200px'): boolean {
  const [seen, setSeen] = useState(now);
  useEffect(() => {
    if (seen) return;
    if (now || typeof IntersectionObserver === 'undefined') return setSeen(true);
    const el = ref.current;
    if (!el) return;
    const io = new IntersectionObserver((entries) => entries.some((e) => e.isIntersecting) && setSeen(true), { rootMargin: margin });
    io.observe(el);
    return () => io.disconnect();
  }, [seen, now, ref, margin]);
  return seen;
}

/** Renders its children only once scrolled near the viewport, so heavy charts load when wanted. */
export function WhenVisible({ children, placeholder, minHeight = 200 }: { children: ReactNode; placeholder?: ReactNode; minHeight?: number }) {
  const ref = useRef<HTMLDivElement>(null);
  const seen = useNearViewport(ref);
  return (
    <div ref={ref} style={seen ? undefined : { minHeight }}>
      {seen ? children : placeholder}
    </div>
  );
}
