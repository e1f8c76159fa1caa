/** `?a=1&b=x` from an object of filters, leaving out what is unset or empty; '' when nothing is set. */
export const queryString = (o: object) => {
  const p = new URLSearchParams();
  for (const [k, v] of Object.entries(o)) if (v !== undefined && v !== '' && v !== null) p.set(k, String(v));
  const s = p.toString();
  return s ? `?${s}` : '';
};
