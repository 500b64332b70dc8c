import { decisionMail, type DecisionMailFacts } from './review-mail';

const facts = (changes: Partial<DecisionMailFacts> = {}): DecisionMailFacts => ({
  decision: 'publish',
  designerName: 'Ilse Varga-Brandt',
  designerEmail: 'demo-designer@example.com',
  moderatorName: 'Odile Rennick',
  planTitle: 'Five-cut crosscut sled',
  number: 2,
  notes: '',
  revisionUrl: 'http://localhost:3000/plans/five-cut-crosscut-sled?r=2',
  editorUrl: 'http://localhost:3000/plans/five-cut-crosscut-sled/r/2/edit',
  workshopUrl: 'http://localhost:3000/workshop',
  ...changes,
});

describe('the e-mail about a review decision', () => {
  it('tells the designer a revision is published, with the link to it', () => {
    const mail = decisionMail(facts());
    expect(mail.to).toBe('demo-designer@example.com');
    expect(mail.subject).toBe('r2 of “Five-cut crosscut sled” is published');
    expect(mail.text).toContain('Hello Ilse Varga-Brandt,');
    expect(mail.text).toContain('Odile Rennick published it');
    expect(mail.text).toContain('http://localhost:3000/plans/five-cut-crosscut-sled?r=2');
    expect(mail.text).not.toContain('A note from the moderator');
  });

  it('carries the notes of a send-back and points to the editor', () => {
    const mail = decisionMail(facts({ decision: 'send-back', notes: '  The fence needs its thickness.  ' }));
    expect(mail.subject).toBe('r2 of “Five-cut crosscut sled” is sent back to you');
    expect(mail.text).toContain('What to change:\n\nThe fence needs its thickness.\n');
    expect(mail.text).toContain('http://localhost:3000/plans/five-cut-crosscut-sled/r/2/edit');
  });

  it('gives the reason of a decline and of a hide', () => {
    expect(decisionMail(facts({ decision: 'decline', notes: 'Copied from a book.' })).text).toContain(
      'Why:\n\nCopied from a book.',
    );
    const hidden = decisionMail(facts({ decision: 'hide', notes: 'The wiring diagram is unsafe.' }));
    expect(hidden.subject).toBe('r2 of “Five-cut crosscut sled” is hidden');
    expect(hidden.text).toContain('The reason:\n\nThe wiring diagram is unsafe.');
  });
});
