// Reads the properties of an iCalendar text (RFC 5545 §3.1: lines folded with CRLF + space,
// NAME;PARAMS:VALUE). Used by the unit and integration tests to check our .ics files.
export type IcsProperty = { name: string; params: string; value: string };

export function icsProperties(text: string): IcsProperty[] {
  const unfolded = text.replace(/\r\n[ \t]/g, "");
  return unfolded.split("\r\n").filter(Boolean).map((line) => {
    const colon = line.indexOf(":");
    const head = line.slice(0, colon);
    const semi = head.indexOf(";");
    return { name: semi < 0 ? head : head.slice(0, semi), params: semi < 0 ? "" : head.slice(semi + 1), value: line.slice(colon + 1) };
  });
}

export const icsValue = (text: string, name: string) => icsProperties(text).find((p) => p.name === name)?.value;

/** 20261201T090000Z → Date; anything else (a floating or zoned time) → null. */
export function icsUtc(value: string | undefined): Date | null {
  const m = /^(\d{4})(\d{2})(\d{2})T(\d{2})(\d{2})(\d{2})Z$/.exec(value ?? "");
  return m ? new Date(Date.UTC(+m[1]!, +m[2]! - 1, +m[3]!, +m[4]!, +m[5]!, +m[6]!)) : null;
}
