export { cx } from "./cx";
export { formatSi, siParts, UNIT_SPACE, MINUS, NO_VALUE, type SiParts } from "@/lib/format";
export { Button, LinkButton, buttonClasses, type ButtonProps, type LinkButtonProps, type ButtonVariant, type ButtonSize } from "./Button";
export { SubmitButton, type SubmitButtonProps } from "./SubmitButton";
export {
  Field,
  TextInput,
  Select,
  Textarea,
  type FieldProps,
  type FieldError,
  type ControlA11y,
  type TextInputProps,
  type SelectProps,
  type SelectOption,
  type TextareaProps,
} from "./Field";
export { FormMessage, type FormMessageProps, type FormMessageTone } from "./FormMessage";
export { Panel, Card, type PanelProps, type CardProps } from "./Panel";
export {
  Badge,
  RoleBadge,
  StatusBadge,
  StatusGlyph,
  ROLE_LABELS,
  STATUS_LABELS,
  type BadgeProps,
  type BadgeTone,
  type Status,
} from "./Badge";
export { Table, THead, TBody, Tr, Th, Td, type TableProps, type ThProps, type TdProps, type SortDirection } from "./Table";
export { Pagination, pageWindow, type PaginationProps } from "./Pagination";
export { EmptyState, type EmptyStateProps } from "./EmptyState";
export { PageHeader, type PageHeaderProps } from "./PageHeader";
export { Quantity, type QuantityProps } from "./Quantity";
export { Caution, CAUTION_TEXT, CAUTION_BENCH, CAUTION_MAINS, CAUTION_HOT, type CautionProps } from "./Caution";
export { MarginBar, marginSummary, marginWords, type MarginBarProps, type MarginSummary } from "./MarginBar";
export { WarningItem, WarningList, SeverityIcon, SEVERITY_LABELS, type WarningItemProps, type WarningListProps, type WarningSeverity } from "./Warning";
