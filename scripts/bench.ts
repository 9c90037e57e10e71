console.log("nothing to benchmark yet: the scale issue adds it");
