import { z } from 'zod'; console.log(z.strictObject({a: z.union([z.number(), z.string()])}).safeParse({}))
