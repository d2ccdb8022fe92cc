import { fireEvent, render, screen, waitFor } from '@testing-library/react-native';
import { SignInForm } from '@/components/account/sign-in-form';

describe('SignInForm', () => {
  it('when submitted empty, shows the schema messages under the fields and does not submit', async () => {
    const onSubmit = jest.fn();
    render(<SignInForm onSubmit={onSubmit} />);

    fireEvent.press(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByText('E-mail is required')).toBeTruthy();
    expect(screen.getByText('Password is required')).toBeTruthy();
    expect(onSubmit).not.toHaveBeenCalled();
  });

  it('when the address is not an e-mail address, says so and does not submit', async () => {
    const onSubmit = jest.fn();
    render(<SignInForm onSubmit={onSubmit} />);

    fireEvent.changeText(screen.getByLabelText('E-mail address'), 'not-an-address');
    fireEvent.changeText(screen.getByLabelText('Password'), 'whatever');
    fireEvent.press(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByText('Enter a valid e-mail address')).toBeTruthy();
    expect(screen.queryByText('Password is required')).toBeNull();
    expect(onSubmit).not.toHaveBeenCalled();
  });

  it('when valid, calls onSubmit with the trimmed values', async () => {
    const onSubmit = jest.fn();
    render(<SignInForm onSubmit={onSubmit} />);

    fireEvent.changeText(screen.getByLabelText('E-mail address'), '  tech@shop.example ');
    fireEvent.changeText(screen.getByLabelText('Password'), 'bench-demo-2026');
    fireEvent.press(screen.getByRole('button', { name: 'Sign in' }));

    await waitFor(() => expect(onSubmit).toHaveBeenCalled());
    expect(onSubmit).toHaveBeenCalledWith({ email: 'tech@shop.example', password: 'bench-demo-2026' });
    expect(screen.queryByText('Enter a valid e-mail address')).toBeNull();
  });

  it('ties each error to its field, so a screen reader reads it with the input', async () => {
    render(<SignInForm onSubmit={jest.fn()} />);

    fireEvent.press(screen.getByRole('button', { name: 'Sign in' }));

    const message = await screen.findByText('E-mail is required');
    const input = screen.getByLabelText('E-mail address');
    expect(input.props['aria-invalid']).toBe(true);
    expect(input.props['aria-describedby']).toBeTruthy();
    expect(message.props.nativeID).toBe(input.props['aria-describedby']);
  });

  it('shows the server failure and its field messages, and disables the button while pending', async () => {
    render(
      <SignInForm
        onSubmit={jest.fn()}
        pending
        failure={{ message: 'The e-mail address or the password is wrong.', fields: { password: 'Wrong password' } }}
      />,
    );

    expect(screen.getByText('The e-mail address or the password is wrong.')).toBeTruthy();
    expect(await screen.findByText('Wrong password')).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Signing in…' })).toBeDisabled();
  });
});
