type Props = { error?: string | null; success?: string | null };

/**
 * The form-level outcome. The live regions stay in the page all the time so screen readers announce a
 * message as soon as it appears.
 */
export function FormMessage({ error, success }: Props) {
  return (
    <>
      <div role="alert" className={error ? 'cw-alert' : undefined}>
        {error ?? null}
      </div>
      <div role="status" className={success && !error ? 'cw-success' : undefined}>
        {!error && success ? success : null}
      </div>
    </>
  );
}
