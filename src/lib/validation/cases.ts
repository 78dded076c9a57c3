import { physicsCases } from './cases-physics';
import { systemCases } from './cases-system';
import { fieldCases } from './cases-field';
import type { ReferenceCase } from './types';

export type { ReferenceCase, ReferenceKind } from './types';

/** Every reference case, physics primitives first; append new families by concatenation here. */
export const referenceCases: ReferenceCase[] = [...physicsCases, ...systemCases, ...fieldCases];
