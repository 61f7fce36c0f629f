/** A register's total as the reader sees it: a count cut at the server's cap reads "more than 10,000". */
export const countText = (total: number, capped = false) =>
  capped ? `more than ${total.toLocaleString('en-GB')}` : String(total);
