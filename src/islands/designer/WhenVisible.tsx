import { useEffect, useRef, useState, type ReactNode } from 'react';

/** Renders its children only once scrolled near the viewport, so heavy charts load when wanted. */
export function WhenVisible({ children, placeholder, minHeight = 200 }: { children: ReactNode; placeholder?: ReactNode; minHeight?: number }) {
  const ref = useRef<HTMLDivElement>(null);
  const [seen, setSeen] = useState(false);
  useEffect(() => {
    const el = ref.current;
    if (!el || seen) return;
    if (typeof IntersectionObserver === 'undefined') return setSeen(true);
    const io = new IntersectionObserver((entries) => entries.some((e) => e.isIntersecting) && setSeen(true), { rootMargin: '200px' });
    io.observe(el);
    return () => io.disconnect();
  }, [seen]);
  return (
    <div ref={ref} style={seen ? undefined : { minHeight }}>
      {seen ? children : placeholder}
    </div>
  );
}
