import { fireEvent, render, screen, waitFor } from '@testing-library/react-native';
import { ChangePasswordForm } from '@/components/account/change-password-form';
import { ResetPasswordForm } from '@/components/account/reset-password-form';
import { SignUpForm } from '@/components/account/sign-up-form';

describe('ResetPasswordForm', () => {
  it('when the two passwords differ, says so under the second and does not submit', async () => {
    const onSubmit = jest.fn();
    render(<ResetPasswordForm onSubmit={onSubmit} />);

    fireEvent.changeText(screen.getByLabelText('New password'), 'a-long-enough-phrase');
    fireEvent.changeText(screen.getByLabelText('New password again'), 'a-long-enough-phrasE');
    fireEvent.press(screen.getByRole('button', { name: 'Set the new password' }));

    expect(await screen.findByText('The two passwords differ.')).toBeTruthy();
    expect(onSubmit).not.toHaveBeenCalled();
  });

  it('when both match and are long enough, submits the password only', async () => {
    const onSubmit = jest.fn();
    render(<ResetPasswordForm onSubmit={onSubmit} />);

    fireEvent.changeText(screen.getByLabelText('New password'), 'a-long-enough-phrase');
    fireEvent.changeText(screen.getByLabelText('New password again'), 'a-long-enough-phrase');
    fireEvent.press(screen.getByRole('button', { name: 'Set the new password' }));

    await waitFor(() => expect(onSubmit).toHaveBeenCalledWith('a-long-enough-phrase'));
  });
});

describe('ChangePasswordForm', () => {
  it('when submitted empty, asks for the current password and the new one, in the form’s words', async () => {
    const onSubmit = jest.fn();
    render(<ChangePasswordForm onSubmit={onSubmit} />);

    fireEvent.press(screen.getByRole('button', { name: 'Change password' }));

    expect(await screen.findByText('Enter your current password.')).toBeTruthy();
    expect(screen.getByText('Use at least 12 characters')).toBeTruthy();
    expect(onSubmit).not.toHaveBeenCalled();
  });

  it('sends the current and the new password, without the repeat', async () => {
    const onSubmit = jest.fn();
    render(<ChangePasswordForm onSubmit={onSubmit} />);

    fireEvent.changeText(screen.getByLabelText('Current password'), 'old-password');
    fireEvent.changeText(screen.getByLabelText('New password'), 'a-long-enough-phrase');
    fireEvent.changeText(screen.getByLabelText('New password again'), 'a-long-enough-phrase');
    fireEvent.press(screen.getByRole('button', { name: 'Change password' }));

    await waitFor(() =>
      expect(onSubmit).toHaveBeenCalledWith({ currentPassword: 'old-password', newPassword: 'a-long-enough-phrase' }),
    );
  });

  it('puts a server message under the field it names, and clears it when that field changes', async () => {
    render(
      <ChangePasswordForm
        onSubmit={jest.fn()}
        failure={{ message: 'Check the fields marked below.', fields: { newPassword: 'This password is too common' } }}
      />,
    );

    expect(await screen.findByText('This password is too common')).toBeTruthy();
    fireEvent.changeText(screen.getByLabelText('New password'), 'another-long-phrase');
    fireEvent.press(screen.getByRole('button', { name: 'Change password' }));

    expect(await screen.findByText('Enter your current password.')).toBeTruthy();
    expect(screen.queryByText('This password is too common')).toBeNull();
  });
});

describe('SignUpForm', () => {
  it('when the name is one letter, shows the schema’s message under it', async () => {
    render(<SignUpForm onSubmit={jest.fn()} />);

    fireEvent.changeText(screen.getByLabelText('Your name'), 'T');
    fireEvent.press(screen.getByRole('button', { name: 'Create account' }));

    expect(await screen.findByText('Use at least 2 characters')).toBeTruthy();
  });
});
