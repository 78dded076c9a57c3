/** Set by the start script's front server (any value a client sends is removed): "1" when the request arrived over HTTPS. */
export const HTTPS_HEADER = 'x-coilwright-https';
