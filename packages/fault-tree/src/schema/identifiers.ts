// The shapes of the identifiers a tree uses. Node ids double as XState state keys, so they may
// not contain the "." and "#" XState reads as paths; value names are what formulas refer to.
import { z } from 'zod';

export const NODE_ID_PATTERN = /^[a-z][a-z0-9]*(?:-[a-z0-9]+)*$/;
export const VALUE_NAME_PATTERN = /^[a-z][A-Za-z0-9]*$/;

export const nodeIdSchema = z.string().max(80).regex(NODE_ID_PATTERN, {
  message:
    'Use lower-case letters, digits and single hyphens, starting with a letter (for example "cap-test").',
});

export const choiceIdSchema = nodeIdSchema;

export const valueNameSchema = z.string().max(40).regex(VALUE_NAME_PATTERN, {
  message:
    'Start with a lower-case letter and use only letters and digits (for example "radiatorInletTemp").',
});

/** A reference to a node. Any string is accepted here; validation names references that lead nowhere. */
export const nodeRefSchema = z.string().max(80);
