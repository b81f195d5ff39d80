"use client";

import {
  Bar,
  BarChart,
  CartesianGrid,
  Legend,
  Line,
  ComposedChart,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from "recharts";
import { formatMoneyWhole } from "@/lib/money";
import { useShopLocale } from "@/components/shop-locale";

/** The charts' colours: the theme's steel, brass and fail (tailwind.config.ts). */
const STEEL = "#3a516c";
const BRASS = "#c9972f";
const FAIL = "#b3261e";
const GRID = "#d8d2c4";

const shortWeek = (iso: string) => {
  const [, m, d] = iso.split("-");
  return `${Number(d)}/${Number(m)}`;
};

/** Shafts that passed final inspection, per week. */
export function FinishedChart({ data }: { data: { week: string; shafts: number }[] }) {
  return (
    <ResponsiveContainer width="100%" height={220}>
      <BarChart data={data} accessibilityLayer={false} margin={{ top: 8, right: 8, left: -16, bottom: 0 }}>
        <CartesianGrid stroke={GRID} vertical={false} />
        <XAxis dataKey="week" tickFormatter={shortWeek} fontSize={12} />
        <YAxis allowDecimals={false} fontSize={12} />
        <Tooltip labelFormatter={(w) => `Week of ${String(w)}`} />
        <Bar dataKey="shafts" name="Shafts finished" fill={STEEL} isAnimationActive={false} />
      </BarChart>
    </ResponsiveContainer>
  );
}

/** Orders that left the shop, by whole days from order to ship. */
export function DaysToShipChart({ data }: { data: { days: string; orders: number }[] }) {
  return (
    <ResponsiveContainer width="100%" height={220}>
      <BarChart data={data} accessibilityLayer={false} margin={{ top: 8, right: 8, left: -16, bottom: 0 }}>
        <CartesianGrid stroke={GRID} vertical={false} />
        <XAxis dataKey="days" fontSize={12} />
        <YAxis allowDecimals={false} fontSize={12} />
        <Tooltip labelFormatter={(d) => `${String(d)} days`} />
        <Bar dataKey="orders" name="Orders" fill={BRASS} isAnimationActive={false} />
      </BarChart>
    </ResponsiveContainer>
  );
}

/** Average hours per routing step (measured, or the default where there is no history). */
export function StepTimeChart({ data }: { data: { name: string; hours: number }[] }) {
  return (
    <ResponsiveContainer width="100%" height={Math.max(160, data.length * 34 + 30)}>
      <BarChart
        data={data}
        layout="vertical"
        accessibilityLayer={false}
        margin={{ top: 4, right: 16, left: 8, bottom: 0 }}
      >
        <CartesianGrid stroke={GRID} horizontal={false} />
        <XAxis type="number" fontSize={12} unit=" h" />
        <YAxis type="category" dataKey="name" width={120} fontSize={12} />
        <Tooltip formatter={(v) => `${Number(v).toFixed(1)} h`} />
        <Bar dataKey="hours" name="Average hours" fill={STEEL} isAnimationActive={false} />
      </BarChart>
    </ResponsiveContainer>
  );
}

/** Money taken per week (deposits and balances stacked) with refunds beside. */
export function MoneyChart({
  data,
}: {
  data: { week: string; depositsCents: number; balancesCents: number; refundsCents: number }[];
}) {
  const { currency } = useShopLocale();
  const dollars = (cents: number) => formatMoneyWhole(cents, currency);
  return (
    <ResponsiveContainer width="100%" height={260}>
      <ComposedChart data={data} accessibilityLayer={false} margin={{ top: 8, right: 8, left: 8, bottom: 0 }}>
        <CartesianGrid stroke={GRID} vertical={false} />
        <XAxis dataKey="week" tickFormatter={shortWeek} fontSize={12} />
        <YAxis tickFormatter={(c) => dollars(Number(c))} fontSize={12} width={70} />
        <Tooltip formatter={(v) => dollars(Number(v))} labelFormatter={(w) => `Week of ${String(w)}`} />
        <Legend wrapperStyle={{ fontSize: 12 }} />
        <Bar dataKey="depositsCents" name="Deposits" stackId="taken" fill={STEEL} isAnimationActive={false} />
        <Bar dataKey="balancesCents" name="Balances" stackId="taken" fill={BRASS} isAnimationActive={false} />
        <Line dataKey="refundsCents" name="Refunds" stroke={FAIL} strokeWidth={2} isAnimationActive={false} />
      </ComposedChart>
    </ResponsiveContainer>
  );
}
