import { ellipKE, ellipKEComplementary, ellipMaxwellCombination, ellipKMinusE, ellipKComplementary } from '/work/main/src/solver/math/ellip';
import ellipk from '@stdlib/math-base-special-ellipk';
import ellipe from '@stdlib/math-base-special-ellipe';
for (const m of [-5, -0.5, 0, 1e-10, 0.1, 0.5, 0.9, 0.999999, 1 - 1e-13, 1]) { const r = ellipKE(m); console.log(m, r.K, ellipk(m), r.E, ellipe(m)); }
console.log(ellipKEComplementary(1e-20), ellipMaxwellCombination(1e-8, 1-1e-8), Math.PI*1e-16/32, ellipKMinusE(1e-10), ellipKComplementary(0.5));
