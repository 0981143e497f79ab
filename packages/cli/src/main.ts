console.log("girth: not built yet");
