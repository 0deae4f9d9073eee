global using SlotArray.Tests.Shared;
