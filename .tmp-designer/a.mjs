import { create, unitDependencies } from 'mathjs'; const m = create({ unitDependencies }); console.log(m.unit('4 in').toNumber('m'));
