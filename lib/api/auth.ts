import type {
  ChangePasswordBody,
  ResetBody,
  SessionDto,
  SignInBody,
  SignUpBody,
  UserAuditDto,
  UserDto,
  RoleValue,
} from '../contracts/auth';
import { apiFetch, apiFetchVoid, query } from './client';

const post = <T>(path: string, body?: unknown) =>
  apiFetch<T>(path, { method: 'POST', body: body === undefined ? undefined : JSON.stringify(body) });

export const signUp = (body: SignUpBody) => post<{ message: string }>('/api/auth/sign-up', body);
export const verifyEmail = (token: string) => post<{ user: UserDto }>('/api/auth/verify', { token });
export const signIn = (body: SignInBody) => post<SessionDto>('/api/auth/sign-in', body);
export const refreshSession = () => post<SessionDto>('/api/auth/refresh');
export const signOut = () => apiFetchVoid('/api/auth/sign-out', { method: 'POST' });
export const forgotPassword = (email: string) => post<{ message: string }>('/api/auth/forgot', { email });
export const resetPassword = (body: ResetBody) => post<{ message: string }>('/api/auth/reset', body);
export const changePassword = (body: ChangePasswordBody) => post<SessionDto>('/api/auth/password', body);
export const signOutEverywhere = () => apiFetchVoid('/api/auth/sign-out-everywhere', { method: 'POST' });

export const listUsers = (q?: string) => apiFetch<UserDto[]>(`/api/users${query({ q })}`);
export const updateUser = (id: number, body: { role?: RoleValue; disabled?: boolean }) =>
  apiFetch<UserDto>(`/api/users/${id}`, { method: 'PATCH', body: JSON.stringify(body) });
export const userAudit = (id: number) => apiFetch<UserAuditDto[]>(`/api/users/${id}/audit`);
