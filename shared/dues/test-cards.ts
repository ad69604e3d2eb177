/** A card token of the local Stripe fake, offered in test mode so no card number is ever typed. */
export interface TestCard {
  token: string;
  label: string;
  outcome: string;
}

/** The fake's test tokens: one that pays, two that are refused. */
export const TEST_CARDS: readonly TestCard[] = [
  { token: 'tok_visa', label: 'Test Visa ending 4242', outcome: 'pays' },
  { token: 'tok_chargeDeclined', label: 'Test card that is declined', outcome: 'declined by the bank' },
  { token: 'tok_chargeDeclinedInsufficientFunds', label: 'Test card without funds', outcome: 'declined: insufficient funds' },
];

/** What a card token looks like; the server never receives card numbers. */
export const CARD_TOKEN_PATTERN = /^tok_[A-Za-z0-9_]{2,100}$/;
