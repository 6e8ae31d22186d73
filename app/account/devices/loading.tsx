export { default } from "@/components/route-loading";
