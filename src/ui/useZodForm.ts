import { zodResolver } from '@hookform/resolvers/zod';
import { useForm, type FieldValues, type Resolver, type UseFormProps } from 'react-hook-form';
import type { z } from 'zod';

/**
 * Messages in our own plain words for the generic checks. Messages written into a shared schema
 * ("Use at least 10 characters") take precedence over these, as zod gives a schema's own message priority.
 */
const plainMessages: z.core.$ZodErrorMap = (issue) => {
  const empty = issue.input === undefined || issue.input === null || issue.input === '';
  switch (issue.code) {
    case 'invalid_type':
      return empty ? 'This is required' : undefined;
    case 'too_small':
      if (issue.origin !== 'string') return undefined;
      return Number(issue.minimum) <= 1 ? 'This is required' : `Use at least ${issue.minimum} characters`;
    case 'too_big':
      return issue.origin === 'string' ? `Use at most ${issue.maximum} characters` : undefined;
    case 'invalid_format':
      if (issue.format === 'email') return 'Enter an e-mail address, like name@example.com';
      if (issue.format === 'datetime') return 'Enter a date and time';
      return undefined;
    default:
      return undefined;
  }
};

/** react-hook-form validated by one of the shared zod schemas, the same the server parses the request with. */
export function useZodForm<S extends z.ZodType<FieldValues, FieldValues>>(
  schema: S,
  options: Omit<UseFormProps<z.input<S>, unknown, z.output<S>>, 'resolver'> = {},
) {
  const resolver = zodResolver(schema as never, { error: plainMessages }) as unknown as Resolver<z.input<S>, unknown, z.output<S>>;
  return useForm<z.input<S>, unknown, z.output<S>>({ ...options, resolver });
}
