import type { Role } from './permissions.js';

/** A user as the API returns it (never the password hash). */
export interface UserView {
  id: number;
  email: string;
  displayName: string;
  role: Role;
  disabled: boolean;
  createdAt: string;
}

export interface LoginResponse {
  accessToken: string;
  user: { id: number; email: string; role: Role; displayName: string };
}

export interface ListResponse<T> {
  items: T[];
  total: number;
}

/** The one error body of the API (CONVENTIONS: API). */
export interface ApiErrorBody {
  statusCode: number;
  error: string;
  message: string;
  fields?: Record<string, string>;
}
