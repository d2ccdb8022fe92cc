import { StyleSheet, View } from 'react-native';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { ChoiceRow } from '../ui/choice-row';
import { Text } from '../ui/text';
import { ROLE_VALUES, type RoleValue, type UserDto } from '@/lib/contracts/auth';
import { Spacing } from '@/lib/theme';
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

/** One account in the admins' list: who, state, role picker, disable/enable, history. */
export function UserRow({ user, isSelf, busy, selected, onRole, onDisabled, onSelect }: UserRowProps) {
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
              if (!busy && r !== user.role) onRole(r);
            }}
          />
          <View style={styles.actions}>
            <Button
              label={user.disabled ? 'Enable account' : 'Disable account'}
              variant="secondary"
              disabled={busy}
              onPress={() => onDisabled(!user.disabled)}
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
});
