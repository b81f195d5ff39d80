"use client";
export { GroupErrorPage as default } from "@/components/group-error-page";
