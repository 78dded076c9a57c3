import type { FieldErrors, Resolver } from 'react-hook-form';
import { checkDesignName } from '~/lib/design/name';
import { toDesignInput, type FormValues } from './values';

// The schema and its unit parser load on the first check (the first save), not with the page: the
// live results already come from the same schema in the worker.
let schemaResolver: Promise<Resolver<FormValues>> | null = null;
function loadSchemaResolver(): Promise<Resolver<FormValues>> {
  schemaResolver ??= Promise.all([import('@hookform/resolvers/zod'), import('~/lib/design/schema'), import('~/lib/format/units-reader')]).then(
    ([{ zodResolver }, { designInputSchema }, { withFullReader }]) => {
      const check = zodResolver(designInputSchema) as unknown as Resolver<FormValues>;
      // plain forms are read without mathjs; it loads on the first text that needs it
      return (values, context, options) => withFullReader(() => check(values, context, options));
    },
  );
  return schemaResolver;
}

/** The schema the API uses checks the design; the form adds only the name. */
export const designResolver: Resolver<FormValues> = async (values, context, options) => {
  const schema = await loadSchemaResolver();
  const r = await schema(toDesignInput(values) as unknown as FormValues, context, options);
  const errors: FieldErrors<FormValues> = { ...r.errors };
  const nameError = checkDesignName(values.name);
  if (nameError) errors.name = { type: 'validate', message: nameError };
  return Object.keys(errors).length ? { values: {}, errors } : { values, errors: {} };
};
