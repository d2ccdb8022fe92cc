/**
 * Hardening, item 4: after too many sign-in attempts the screen says how long to wait,
 * from the answer's Retry-After, not a fixed "a minute".
 */
import { render, screen } from '@testing-library/react-native';
import { SignInForm } from '@/components/account/sign-in-form';
import { formFailure } from '@/components/ui/form-failure';
import { errorFromAnswer } from '@/lib/api/client';
import { waitPhrase } from '@/lib/api/describe-error';

const tooMany = JSON.stringify({ status: 429, code: 'rate_limited', detail: 'Too many attempts.', retryAfter: 143 });

describe('the sign-in form after a 429', () => {
  it('shows the wait the server gave in Retry-After (143 s: 2 minutes 23 seconds)', () => {
    render(<SignInForm onSubmit={jest.fn()} failure={formFailure(errorFromAnswer(429, tooMany, false, '143'))} />);
    expect(screen.getByText('Too many attempts. Wait 2 minutes 23 seconds and try again.')).toBeTruthy();
  });

  it('reads an HTTP-date Retry-After too', () => {
    const at = new Date(Date.now() + 45_000).toUTCString();
    const failure = formFailure(errorFromAnswer(429, '', false, at));
    expect(failure?.message).toMatch(/^Too many attempts\. Wait (44|45) seconds and try again\.$/);
  });

  it('falls back to the body’s retryAfter when a proxy dropped the header', () => {
    expect(formFailure(errorFromAnswer(429, tooMany, false, null))?.message).toBe(
      'Too many attempts. Wait 2 minutes 23 seconds and try again.',
    );
  });
});

describe('waitPhrase', () => {
  it.each([
    [1, '1 second'],
    [59, '59 seconds'],
    [60, '1 minute'],
    [143, '2 minutes 23 seconds'],
    [900, '15 minutes'],
    [3600, '1 hour'],
    [3725, '1 hour 3 minutes'],
  ])('%i s reads "%s"', (seconds, phrase) => {
    expect(waitPhrase(seconds)).toBe(phrase);
  });
});
