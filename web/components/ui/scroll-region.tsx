import { useEffect, useRef, useState, type ReactNode } from 'react';

interface ScrollRegionProps {
  /** Names the region for screen readers, e.g. the caption of the table inside. */
  label: string;
  className?: string;
  children: ReactNode;
}

/**
 * A box that scrolls when its content is wider (or taller) than the screen allows, such as a table
 * on a phone. While it overflows it is a named, focusable region, so a keyboard user can Tab to it
 * and scroll it with the arrow keys; when everything fits it adds no tab stop.
 */
export function ScrollRegion({ label, className = '', children }: ScrollRegionProps) {
  const box = useRef<HTMLDivElement>(null);
  const [overflowing, setOverflowing] = useState(false);
  useEffect(() => {
    const el = box.current;
    if (!el) return;
    // The observer reports once on observe, then on every size change of the box or its content.
    const observer = new ResizeObserver(() => setOverflowing(el.scrollWidth > el.clientWidth + 1 || el.scrollHeight > el.clientHeight + 1));
    observer.observe(el);
    if (el.firstElementChild) observer.observe(el.firstElementChild);
    return () => observer.disconnect();
  }, []);
  return (
    <div ref={box} className={className} {...(overflowing ? { tabIndex: 0, role: 'region', 'aria-label': label } : {})}>
      {children}
    </div>
  );
}
