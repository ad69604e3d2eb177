import { escapeHtml, renderMail } from './mail-layout';

describe('mail layout', () => {
  const mail = renderMail({
    subject: 'Receipt',
    greeting: 'Hello <Ada>,',
    paragraphs: ['Thanks & cheers.'],
    facts: [['Amount', '12.00 EUR']],
    action: { label: 'Your dues', url: 'http://127.0.0.1:4300/dues?a=1&b=2' },
  });

  it('the text part carries every fact and the link in plain words', () => {
    expect(mail.text).toContain('Hello <Ada>,');
    expect(mail.text).toContain('Amount: 12.00 EUR');
    expect(mail.text).toContain('Your dues:\nhttp://127.0.0.1:4300/dues?a=1&b=2');
  });

  it('the HTML part escapes names and links', () => {
    expect(mail.html).toContain('Hello &lt;Ada&gt;,');
    expect(mail.html).toContain('href="http://127.0.0.1:4300/dues?a=1&amp;b=2"');
    expect(mail.html).not.toContain('<Ada>');
  });

  it('escapeHtml escapes quotes too', () => {
    expect(escapeHtml(`"x'`)).toBe('&quot;x&#39;');
  });
});
