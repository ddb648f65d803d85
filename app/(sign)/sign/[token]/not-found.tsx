export default function SigningLinkNotFound() {
  return (
    <div className="panel mx-auto mt-12 max-w-lg text-center">
      <p className="measure text-sm text-ink-faint">404</p>
      <h1 className="mt-2 text-xl">Signing link not found</h1>
      <p className="mt-2 text-sm text-ink-soft">
        This link does not exist. Check that it was copied whole, or ask the sender for it again.
      </p>
    </div>
  );
}
