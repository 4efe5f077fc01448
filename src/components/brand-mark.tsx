/**
 * Photon Parity's mark: a lamp's arc of light over two equal columns (two options leveled to the
 * same light). Drawn for this product.
 */
export function BrandMark({ size = 28, title }: { size?: number; title?: string }) {
  return (
    <svg width={size} height={size} viewBox="0 0 32 32" role={title ? 'img' : undefined} aria-hidden={title ? undefined : true} aria-label={title}>
      <rect width="32" height="32" rx="7" fill="#1f4a4f" />
      <path d="M7 15a9 9 0 0 1 18 0" fill="none" stroke="#f2c66d" strokeWidth="2.6" strokeLinecap="round" />
      <rect x="9" y="18" width="5" height="8" rx="1.2" fill="#f4f1e8" />
      <rect x="18" y="18" width="5" height="8" rx="1.2" fill="#f4f1e8" />
    </svg>
  );
}
