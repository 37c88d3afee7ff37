// Column headers the detectors recognise, in any case. Time headers live in time.ts.

/** "Well", "Well ID", "Well position", ... */
export const WELL_HEADER = /^well(?:\s*(?:id|name|position|pos\.?|no\.?))?$/i;

/** A measured-value column of a long table: "Value", "Absorbance 405 nm", "OD600", "RFU", ... */
export const VALUE_HEADER =
  /^(?:values?|abs(?:orbance)?|od|optical density|fluorescence|fluo|rfu|rlu|signal|results?|raw(?: data)?|measurements?|reading|intensity|luminescence|counts?)(?![a-z])/i;

/** Value headers that say nothing about the read, so the label is looked for around the table. */
export const BARE_VALUE_HEADER = /^(?:values?|results?|measurements?|reading|raw(?: data)?)$/i;

/** "Temp", "Temperature [°C]", "T° 405", "°C". */
export const TEMPERATURE_HEADER = /^(?:temp(?:erature)?\b|t\s*°|°c\b)|\btemperature\b/i;
