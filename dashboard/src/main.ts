import { mount } from "svelte";
import "./lib/theme.css";
import App from "./App.svelte";

const target = document.getElementById("app");
if (!target) throw new Error("Brackline: the page has no #app element to mount on.");

mount(App, { target });
