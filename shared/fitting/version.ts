/** Version of the fitting engine; stored with every fit so that a result can be traced. */
export const ENGINE_VERSION = '1.0.0';
