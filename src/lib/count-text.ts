/** A register's total as the reader sees it: a count cut at the server's cap reads "more than 10,000". */
export const countText = (total: number, capped = false) =>
  capped ? `more than ${total.toLocaleString('en-GB')}` : String(total);

/** A count with its noun, singular for one: "1 jar", "3 contaminated jars". */
export const countOf = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;
