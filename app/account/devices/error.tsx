"use client";
export { default } from "@/components/route-error";
