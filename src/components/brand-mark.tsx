/**
 * Photon Parity's mark: a lamp bar shining its light evenly on two equal columns (two options
 * leveled to the same light). Drawn for this product.
 */
export function BrandMark({ size = 28, title }: { size?: number; title?: string }) {
  return (
    <svg width={size} height={size} viewBox="0 0 32 32" role={title ? 'img' : undefined} aria-hidden={title ? undefined : true} aria-label={title}>
      <rect width="32" height="32" rx="7" fill="#1f4a4f" />
      <rect x="7" y="6" width="18" height="3" rx="1.5" fill="#f2c66d" />
      <path d="M9 10h14l4 8H5z" fill="#f2c66d" opacity="0.4" />
      <rect x="9" y="19" width="5" height="7" rx="1.2" fill="#f4f1e8" />
      <rect x="18" y="19" width="5" height="7" rx="1.2" fill="#f4f1e8" />
    </svg>
  );
}
