import { hopwiseBrand } from './theme/hopwise-theme';

interface HopwiseMarkProps {
  size?: number;
  /** Give a title when the mark stands alone; leave it out when the product name is next to it. */
  title?: string;
}

/** The Hopwise mark: a signal hopping twice between two ground stations. */
export function HopwiseMark({ size = 32, title }: HopwiseMarkProps) {
  return (
    <svg
      width={size}
      height={size}
      viewBox="0 0 32 32"
      role={title ? 'img' : undefined}
      aria-hidden={title ? undefined : true}
      focusable="false"
    >
      {title && <title>{title}</title>}
      <rect width="32" height="32" rx="7" fill={hopwiseBrand[40]} />
      <path
        d="M4.5 23.5 Q10.25 6 16 23.5 Q21.75 6 27.5 23.5"
        fill="none"
        stroke={hopwiseBrand[120]}
        strokeWidth="2.6"
        strokeLinecap="round"
        strokeLinejoin="round"
      />
      <path
        d="M3.5 26.5 H28.5"
        stroke={hopwiseBrand[150]}
        strokeWidth="1.6"
        strokeLinecap="round"
      />
      <circle cx="4.5" cy="23.5" r="2.3" fill={hopwiseBrand[160]} />
      <circle cx="27.5" cy="23.5" r="2.3" fill={hopwiseBrand[160]} />
    </svg>
  );
}
