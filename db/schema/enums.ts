import { pgEnum } from 'drizzle-orm/pg-core';

export const userRole = pgEnum('user_role', ['sales_engineer', 'customer', 'support', 'admin']);
export const unitSystem = pgEnum('unit_system', ['si', 'us']);
export const service = pgEnum('service', ['heater', 'compressor']);
export const quoteStatus = pgEnum('quote_status', ['draft', 'sent', 'won', 'lost']);
export const outboxStatus = pgEnum('outbox_status', ['pending', 'sent', 'dead']);

export const userRoles = userRole.enumValues;
export type UserRole = (typeof userRoles)[number];
export type QuoteStatus = (typeof quoteStatus.enumValues)[number];
