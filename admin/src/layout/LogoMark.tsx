import type { SVGProps } from 'react';

/**
 * Pourgate's mark: a gate (two posts and a lintel) with one drop falling through it, the drop
 * split into the two parts of the mix. `framed` adds the dark tile used for the favicon.
 */
export function LogoMark({ size = 28, framed = false, title, ...rest }: SVGProps<SVGSVGElement> & { size?: number; framed?: boolean; title?: string }) {
  return (
    <svg
      viewBox="0 0 32 32"
      width={size}
      height={size}
      role={title ? 'img' : undefined}
      aria-hidden={title ? undefined : true}
      focusable="false"
      {...rest}
    >
      {title ? <title>{title}</title> : null}
      {framed ? <rect width="32" height="32" rx="7" fill="#14262b" /> : null}
      <path d="M6 7.5h20M8.5 7.5v18M23.5 7.5v18" stroke="#f1e6cc" strokeWidth="3" strokeLinecap="round" fill="none" />
      <path d="M16 10.5c0 0-5.2 6-5.2 9.8a5.2 5.2 0 0 0 5.2 5.2z" fill="#e8a33d" />
      <path d="M16 10.5c0 0 5.2 6 5.2 9.8a5.2 5.2 0 0 1-5.2 5.2z" fill="#4fb3a9" />
    </svg>
  );
}
