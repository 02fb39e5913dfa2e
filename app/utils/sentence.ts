// Server messages start in lower case (they read well after a field name); on screen they stand
// alone, so they start with a capital.
export function sentence(message: string): string {
  return message.charAt(0).toLocaleUpperCase('en-GB') + message.slice(1);
}
