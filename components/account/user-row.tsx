import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { ChoiceRow } from '../ui/choice-row';
import { Text } from '../ui/text';
import { ROLE_VALUES, type RoleValue, type UserDto } from '@/lib/contracts/auth';
import { Radius, Spacing } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';
import { ROLE_LABELS } from './account-summary';

export type UserRowProps = {
  user: UserDto;
  /** The signed-in admin's own row: no role or disable controls (the server refuses them too). */
  isSelf: boolean;
  busy: boolean;
  selected: boolean;
  onRole: (role: RoleValue) => void;
  onDisabled: (disabled: boolean) => void;
  onSelect: () => void;
};

const ROLE_OPTIONS = ROLE_VALUES.map((value) => ({ value, label: ROLE_LABELS[value] }));

/** A change waiting for the admin's "yes": a new role, or disabling the account. */
type Pending = { kind: 'role'; role: RoleValue } | { kind: 'disable' };

/**
 * One account in the admins' list: who, state, role picker, disable/enable, history. A role change and
 * disabling an account are far-reaching, so each asks once ("Change … to Editor?") before it is sent;
 * enabling an account again is sent at once.
 */
export function UserRow({ user, isSelf, busy, selected, onRole, onDisabled, onSelect }: UserRowProps) {
  const t = useTheme();
  const [pending, setPending] = useState<Pending | null>(null);
  const confirm = () => {
    if (!pending) return;
    if (pending.kind === 'role') onRole(pending.role);
    else onDisabled(true);
    setPending(null);
  };
  const state = [user.disabled ? 'Disabled' : null, user.emailVerified ? null : 'Address not confirmed']
    .filter(Boolean)
    .join(' · ');
  return (
    <Card testID={`user-${user.id}`} accessibilityLabel={`${user.displayName}, ${user.email}`}>
      <View style={styles.who}>
        <Text variant="heading">
          {user.displayName}
          {isSelf ? ' (you)' : ''}
        </Text>
        <Text color="textMuted" style={styles.email}>
          {user.email}
        </Text>
        {state ? (
          <Text variant="label" color={user.disabled ? 'fail' : 'marginal'}>
            {state}
          </Text>
        ) : null}
      </View>
      {isSelf ? (
        <Text color="textMuted">{ROLE_LABELS[user.role]}. Another admin can change your own role or account.</Text>
      ) : (
        <>
          <ChoiceRow
            label="Role"
            options={ROLE_OPTIONS}
            value={user.role}
            onChange={(r) => {
              if (!busy) setPending(r === user.role ? null : { kind: 'role', role: r });
            }}
          />
          {pending ? (
            <View
              style={[styles.confirm, { borderColor: t.cautionBorder, backgroundColor: t.cautionSurface }]}
              accessibilityRole="alert"
              testID={`confirm-${user.id}`}
            >
              <Text>
                {pending.kind === 'role'
                  ? `Change ${user.displayName}’s role from ${ROLE_LABELS[user.role]} to ${ROLE_LABELS[pending.role]}?`
                  : `Disable ${user.displayName}’s account? They are signed out and cannot sign in until an admin enables it again.`}
              </Text>
              <View style={styles.actions}>
                <Button
                  label={
                    pending.kind === 'role' ? `Yes, make ${ROLE_LABELS[pending.role]}` : 'Yes, disable the account'
                  }
                  onPress={confirm}
                  testID={`confirm-yes-${user.id}`}
                />
                <Button
                  label="Cancel"
                  variant="secondary"
                  onPress={() => setPending(null)}
                  testID={`confirm-no-${user.id}`}
                />
              </View>
            </View>
          ) : null}
          <View style={styles.actions}>
            <Button
              label={user.disabled ? 'Enable account' : 'Disable account'}
              variant="secondary"
              disabled={busy}
              onPress={() => (user.disabled ? onDisabled(false) : setPending({ kind: 'disable' }))}
              testID={`toggle-disabled-${user.id}`}
            />
            <Button
              label={selected ? 'Hide history' : 'Show history'}
              variant="quiet"
              onPress={onSelect}
              testID={`history-${user.id}`}
            />
          </View>
        </>
      )}
    </Card>
  );
}

const styles = StyleSheet.create({
  who: { gap: Spacing.xs },
  email: { flexShrink: 1 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: Spacing.sm },
  confirm: { borderWidth: 1, borderRadius: Radius.md, padding: Spacing.md, gap: Spacing.sm },
});
