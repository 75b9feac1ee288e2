import { useLayoutEffect, useState, type RefObject } from 'react';

/**
 * The rendered width of an element, kept current as the layout changes, so a chart draws
 * at its real size (text stays the size of the page's text on a phone and on a projector)
 * instead of scaling a fixed drawing.
 */
export function useElementWidth(ref: RefObject<HTMLElement | null>, fallback = 640): number {
  const [width, setWidth] = useState(fallback);
  useLayoutEffect(() => {
    const element = ref.current;
    if (!element) return;
    const update = () => {
      const next = Math.floor(element.getBoundingClientRect().width);
      if (next > 0) setWidth(next);
    };
    update();
    const observer = new ResizeObserver(update);
    observer.observe(element);
    return () => observer.disconnect();
  }, [ref]);
  return width;
}
