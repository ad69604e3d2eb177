/** One of my batches that a booking can serve, or (for admins) a person to book for: an id and a name. */
export interface NamedChoice {
  id: number;
  name: string;
}
